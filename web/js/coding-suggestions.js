// Coding: suggested codes for the page's answers, read from the server (and read again while the
// suggestions still learn in the background), and the box of them under the shown answer.
import { api, query } from './api.js';
import { h } from './dom.js';
import { state, currentAnswer, shownCodes } from './coding-state.js';
import { renderAnswer } from './coding-draw.js';
import { accept } from './coding-changes.js';

export async function fetchSuggestions() {
  clearTimeout(state.suggestTimer);
  if (!state.page || state.page.answers.length === 0) return;
  const asked = state.page;
  try {
    const got = await api(`/api/suggestions${query({ answers: asked.answers.map((a) => a.id).join(',') })}`);
    if (asked !== state.page) return;
    state.suggestState = got;
    const suggestions = new Map();
    for (const s of got.suggestions) {
      if (!suggestions.has(s.answer_id)) suggestions.set(s.answer_id, []);
      suggestions.get(s.answer_id).push(s);
    }
    for (const list of suggestions.values()) list.sort((a, b) => b.confidence - a.confidence);
    state.suggestions = suggestions;
    renderAnswer(currentAnswer()?.id);
    // Training runs in the background; look again while it does.
    if (got.training || !got.ready) {
      state.suggestTimer = setTimeout(() => {
        if (!document.getElementById('screen-coding').hidden) fetchSuggestions();
      }, 2000);
    }
  } catch (e) {
    state.suggestState = { ready: false, training: false, problem: e.message };
  }
}

function shownSuggestions(answer) {
  if (!answer) return [];
  const has = shownCodes(answer);
  const { byId } = state;
  return (state.suggestions.get(answer.id) || []).filter((s) => !has.has(s.code_id) && byId.has(s.code_id) && !byId.get(s.code_id).archived);
}

export function topSuggestion(answer) {
  return shownSuggestions(answer)[0] || null;
}

export function suggestionBox(answer) {
  const list = shownSuggestions(answer);
  const { suggestState } = state;
  const box = h('section', { class: 'suggestions', id: 'coding-suggestions', 'aria-label': 'Suggested codes' });
  if (list.length > 0) {
    box.append(
      h('h2', {}, 'Suggested'),
      h(
        'ol',
        {},
        list.map((s, i) =>
          h(
            'li',
            { class: i === 0 ? 'top' : '', 'data-code': String(s.code_id) },
            h('button', { type: 'button', class: 'quiet', on: { click: () => accept(answer, s) } }, i === 0 ? h('kbd', {}, 'Enter') : null, ` ${s.code}`),
            h('span', { class: 'confidence' }, `${Math.round(s.confidence * 100)}% sure`),
          ),
        ),
      ),
    );
  } else if (suggestState.problem) {
    box.append(h('p', { class: 'hint' }, `Suggestions are unavailable: ${suggestState.problem}`));
  } else if (!suggestState.ready) {
    box.append(h('p', { class: 'hint' }, suggestState.training ? 'Learning from your codes\u2026 suggestions follow.' : 'Suggestions appear once a code has 8 answers coded by hand (and 8 without it).'));
  } else {
    box.append(h('p', { class: 'hint' }, 'No suggestion for this answer.'));
  }
  return box;
}
