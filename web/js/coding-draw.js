// Coding: drawing the screen from its state. The answer shown (one at a time, or the page as a
// list) with its codes, marked words and suggestions; the code buttons; the progress and the
// saving line.
import { wholeText } from './api.js';
import { h, fill, count, plural } from './dom.js';
import { state, READ_KEY, currentAnswer, shownCodes, shownMarked, readNow } from './coding-state.js';
import { toggle, toggleRead } from './coding-changes.js';
import { suggestionBox } from './coding-suggestions.js';

export function focusWork() {
  if (!document.getElementById('screen-coding').hidden) state.els.work.focus({ preventScroll: true });
}

export function setView(v) {
  const { els } = state;
  state.view = v;
  els.viewFocus.setAttribute('aria-pressed', String(v === 'focus'));
  els.viewList.setAttribute('aria-pressed', String(v === 'list'));
  renderAll();
  focusWork();
}

export function renderAll() {
  const { els, page } = state;
  if (!els) return;
  renderKeys();
  renderProgress();
  renderSaving();
  if (!page) return;
  if (page.answers.length === 0) {
    fill(els.work, h('div', { class: 'empty' }, h('p', {}, 'No answer matches these filters.'), h('p', {}, state.codes.length === 0 ? 'Start by adding codes on the Codebook screen.' : 'Change the filters above, or clear the search.')));
    return;
  }
  if (state.view === 'focus') {
    fill(els.work, focusCard(currentAnswer()));
  } else {
    const list = h('ol', { class: 'coding-list', id: 'coding-list' }, page.answers.map((a, i) => listRow(a, i)));
    fill(els.work, list);
    list.children[state.at]?.scrollIntoView({ block: 'nearest' });
  }
}

export function renderAnswer(id) {
  const { page } = state;
  if (!page || id === undefined) return;
  const i = page.answers.findIndex((a) => a.id === id);
  if (i < 0) return;
  if (state.view === 'focus') {
    if (i === state.at) fill(state.els.work, focusCard(page.answers[i]));
  } else {
    const list = document.getElementById('coding-list');
    const old = list && list.children[i];
    if (old) old.replaceWith(listRow(page.answers[i], i));
  }
}

function codeChip(code, shown) {
  const chip = h(
    'li',
    { class: `chip${shown.pending ? ' pending' : ''}`, 'data-code': String(code.id), title: shown.pending ? 'saving\u2026' : `${shown.origin}` },
    code.key ? h('kbd', {}, code.key) : null,
    h('span', { class: 'chip-name' }, code.name),
    shown.origin === 'suggestion' ? h('span', { class: 'chip-origin' }, 'accepted') : null,
    shown.origin === 'rule' ? h('span', { class: 'chip-origin' }, 'by rule') : null,
    shown.span ? h('span', { class: 'chip-origin' }, 'words marked') : null,
  );
  if (code.colour) chip.style.setProperty('--code-colour', code.colour);
  return chip;
}

function chips(answer, id) {
  const shown = shownCodes(answer);
  const list = h('ul', { class: 'chips', id, 'aria-label': 'Codes of this answer' });
  for (const c of state.codes) {
    if (shown.has(c.id)) list.append(codeChip(c, shown.get(c.id)));
  }
  if (shown.size === 0) list.append(h('li', { class: 'chip none' }, readNow(answer) ? 'read: no code applies' : 'no code yet'));
  return list;
}

/** The answer's text with the marked words of its codes wrapped in <mark>, as text nodes. */
function answerText(answer, id) {
  const spans = [];
  for (const [codeId, s] of shownCodes(answer)) if (s.span) spans.push({ ...s.span, code: state.byId.get(codeId) });
  spans.sort((a, b) => a.start - b.start);
  const p = h('p', { class: 'answer-text', id });
  const text = answer.text;
  let pos = 0;
  for (const s of spans) {
    const start = Math.max(pos, Math.min(s.start, text.length));
    const end = Math.max(start, Math.min(s.end, text.length));
    if (start > pos) p.append(document.createTextNode(text.slice(pos, start)));
    if (end > start) {
      const m = h('mark', { title: s.code ? s.code.name : '' }, text.slice(start, end));
      if (s.code && s.code.colour) m.style.setProperty('--code-colour', s.code.colour);
      p.append(m);
    }
    pos = Math.max(pos, end);
  }
  if (pos < text.length) p.append(document.createTextNode(text.slice(pos)));
  return p;
}

// A long answer comes with its first characters only (truncated); this fetches the whole text
// when asked. It sits outside the answer's paragraph, so selections for spans count only the text.
function showAll(answer) {
  if (!answer.truncated) return null;
  const fetchAll = async (e) => {
    e.stopPropagation();
    try {
      answer.text = await wholeText(answer.id);
      answer.truncated = false;
      state.errors.delete(answer.id);
    } catch (err) {
      state.errors.set(answer.id, `Could not show the whole answer: ${err.message}`);
    }
    renderAll();
  };
  return h('button', { type: 'button', class: 'quiet show-all', on: { click: fetchAll } }, `Show all ${count(answer.length)} characters`);
}

// The answer's wave, question, respondent and segments. Each value from the export sits in its own
// <bdi>, so a bidirectional override inside one (U+202E …) cannot reorder the rest of the line.
function meta(answer) {
  const seg = Object.entries(answer.segments || {}).map(([k, v]) => [h('bdi', {}, k), ' ', h('bdi', {}, v)]);
  const parts = [h('bdi', {}, answer.wave), `Q${answer.question_number}`, ['respondent ', h('bdi', {}, answer.respondent)], ...seg, answer.substantive ? (readNow(answer) ? 'read' : 'not read yet') : 'non-answer'].filter(Boolean);
  return parts.flatMap((part, i) => (i === 0 ? [part] : [' \u00b7 ', part]));
}

function focusCard(answer) {
  const { page } = state;
  const n = page.offset + state.at + 1;
  const error = state.errors.get(answer.id);
  return h(
    'article',
    { class: 'answer-card', id: 'coding-card', 'data-answer': String(answer.id), 'aria-labelledby': 'coding-card-title' },
    h('p', { class: 'meta', id: 'coding-card-title' }, `Answer ${count(n)} of ${count(page.total)} \u00b7 `, meta(answer)),
    h('p', { class: 'question' }, answer.question),
    answerText(answer, 'coding-text'),
    showAll(answer),
    chips(answer, 'coding-codes'),
    error ? h('p', { class: 'error', role: 'alert', id: 'coding-answer-error' }, error) : null,
    suggestionBox(answer),
  );
}

function listRow(answer, i) {
  const error = state.errors.get(answer.id);
  const at = state.at;
  return h(
    'li',
    {
      class: `coding-row${i === at ? ' current' : ''}`,
      'data-answer': String(answer.id),
      'aria-current': i === at ? 'true' : null,
      on: { click: () => { state.at = i; renderAll(); } },
    },
    h('p', { class: 'meta' }, `${count(state.page.offset + i + 1)} \u00b7 `, meta(answer)),
    h('p', { class: 'answer-text' }, answer.text),
    showAll(answer),
    chips(answer, i === at ? 'coding-codes' : null),
    error ? h('p', { class: 'error', role: 'alert' }, error) : null,
  );
}

/** The side panel's code buttons (pressed for the codes of the shown answer) and the read button. */
export function renderKeys() {
  const { codes } = state;
  // Codes with a key first (they are the ones a coder presses), each group in codebook order.
  const active = [...codes.filter((c) => !c.archived && c.key), ...codes.filter((c) => !c.archived && !c.key)];
  const answer = currentAnswer();
  const shown = answer ? shownCodes(answer) : new Map();
  fill(
    state.els.keys,
    h('h2', {}, 'Codes'),
    active.length === 0
      ? h('p', { class: 'hint' }, 'No codes yet. Add them on the Codebook screen; give each a key.')
      : h(
          'ul',
          { class: 'keylist', id: 'coding-keylist' },
          active.map((c) => {
            const b = h(
              'button',
              {
                type: 'button',
                class: `keybtn${shown.has(c.id) ? ' on' : ''}`,
                'aria-pressed': String(shown.has(c.id)),
                'data-code': String(c.id),
                on: { click: () => { toggle(currentAnswer(), c); focusWork(); } },
              },
              c.key ? h('kbd', {}, c.key) : h('span', { class: 'nokey', 'aria-hidden': 'true' }),
              h('span', {}, c.name),
            );
            if (c.colour) b.style.setProperty('--code-colour', c.colour);
            return h('li', {}, b);
          }),
        ),
    h(
      'button',
      {
        type: 'button',
        class: `keybtn readbtn${answer && shownMarked(answer) ? ' on' : ''}`,
        id: 'coding-read-none',
        'aria-pressed': String(!!answer && shownMarked(answer)),
        disabled: !answer,
        on: { click: () => { toggleRead(currentAnswer()); focusWork(); } },
      },
      h('kbd', {}, READ_KEY),
      h('span', {}, 'Read, no code applies'),
    ),
  );
}

/** Substantive answers read, the server's count adjusted by this page's changes since. */
function readCount() {
  const { page } = state;
  if (!page) return 0;
  let n = page.read;
  for (const a of page.answers) {
    if (!a.substantive) continue;
    const now = readNow(a);
    const was = state.baseRead.get(a.id);
    if (now && !was) n++;
    if (!now && was) n--;
  }
  return Math.max(0, Math.min(n, page.substantive));
}

export function renderProgress() {
  const { els, page } = state;
  if (!page) return;
  const read = readCount();
  const apart = page.total - page.substantive;
  const pct = page.substantive ? ` (${Math.round((100 * read) / page.substantive)}%)` : '';
  els.progress.textContent = `Read ${count(read)} of ${plural(page.substantive, 'answer')}${pct}${apart ? ` \u00b7 ${plural(apart, 'non-answer')} apart` : ''}`;
  els.bar.max = Math.max(1, page.substantive);
  els.bar.value = read;
  renderKeys();
}

export function renderSaving(note) {
  const { els, lastMessage } = state;
  if (!els) return;
  const n = state.queue.length;
  els.saving.textContent = note || (n > 0 ? `Saving ${plural(n, 'change')}\u2026` : lastMessage ? `Saved. ${lastMessage}` : '');
  els.saving.classList.toggle('busy', n > 0);
}
