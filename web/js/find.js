// Finding answers: the analysts' query language, counts per wave, the matched words marked, and
// answers like one answer.
import { api, wholeText, query, ApiError } from './api.js';
import { h, fill, clear, count, plural, highlighted } from './dom.js';

const SYNTAX = [
  ['delivery', 'the word or its forms (delivered, deliveries)'],
  ['late delivery', 'answers with both words'],
  ['"delivery date"', 'the phrase (also "delivery dates")'],
  ['exact:"delivery dates"', 'the phrase exactly as written'],
  ['"late delivery"~3', 'both words within three words'],
  ['refurb*', 'words starting with refurb'],
  ['price OR cost, warranty NOT pump', 'either; one without the other'],
  ['wave:"Wave 3", question:2', 'one wave; one question'],
  ['code:"price too high", is:uncoded', 'by code; answers without any code'],
  ['device:mobile', 'by a segment column of the export'],
];

let els;

export function mount(section) {
  els = {};
  els.input = h('input', {
    type: 'search',
    id: 'find-query',
    autocomplete: 'off',
    spellcheck: 'false',
    'aria-describedby': 'find-help',
    placeholder: 'e.g. "delivery date" AND wave:"Wave 3"',
  });
  els.error = h('div', { class: 'error', id: 'find-error', role: 'alert', hidden: true });
  els.summary = h('div', { class: 'result-summary', id: 'find-summary', 'aria-live': 'polite' });
  els.hits = h('ol', { class: 'hits', id: 'find-hits' });
  const form = h(
    'form',
    { class: 'searchbar', role: 'search', on: { submit: (e) => { e.preventDefault(); run(); } } },
    h('label', { for: 'find-query' }, 'Query'),
    h('div', { class: 'row' }, els.input, h('button', { type: 'submit', class: 'primary' }, 'Find')),
    els.error,
  );
  fill(
    section,
    h('h1', { id: 'h-find' }, 'Find answers'),
    form,
    h(
      'details',
      { class: 'syntax', id: 'find-help' },
      h('summary', {}, 'How to write a query'),
      h('dl', {}, SYNTAX.map(([q, what]) => [h('dt', {}, h('code', {}, q)), h('dd', {}, what)])),
    ),
    els.summary,
    els.hits,
  );
  empty('Write a query and press Enter. Press / from anywhere to come back here.');
}

export function shown(params) {
  if (params.q !== undefined) {
    els.input.value = params.q;
    run();
  }
  if (params.focus || params.q === undefined) focus();
}

export function focus() {
  els.input.focus();
  els.input.select();
}

function empty(message) {
  fill(els.summary, h('p', { class: 'empty' }, message));
  clear(els.hits);
}

async function run() {
  const q = els.input.value.trim();
  hideError();
  if (!q) {
    empty('Write a query and press Enter.');
    return;
  }
  try {
    const result = await api(`/api/search${query({ q, limit: 100 })}`);
    show(result, `${plural(result.total, 'answer')} match`);
  } catch (e) {
    showError(e, q);
  }
}

async function like(hit) {
  hideError();
  try {
    const result = await api(`/api/answers/${hit.answer_id}/similar${query({ limit: 30 })}`);
    show(result, `${plural(result.total, 'answer')} like answer #${hit.answer_id} (${hit.respondent}, ${hit.wave})`);
    els.summary.querySelector('h2')?.focus();
  } catch (e) {
    showError(e, null);
  }
}

function show(result, title) {
  const waves = Object.entries(result.waves);
  fill(
    els.summary,
    h('h2', { tabindex: '-1', id: 'find-total' }, title),
    waves.length
      ? h('ul', { class: 'wave-counts', 'aria-label': 'Matches per wave' }, waves.map(([w, n]) => h('li', {}, h('span', {}, w), h('strong', {}, count(n)))))
      : null,
    result.total > result.hits.length ? h('p', { class: 'hint' }, `Showing the ${count(result.hits.length)} most relevant.`) : null,
    result.total === 0 ? h('p', { class: 'empty' }, 'Nothing matches. Try fewer words, or a word’s stem with *.') : null,
  );
  fill(els.hits, result.hits.map(hitItem));
}

function hitItem(hit) {
  const answer = h('p', { class: 'answer' }, highlighted(hit.text, hit.highlight));
  // A long answer comes shortened; its whole text is fetched only when asked for.
  const all = hit.truncated
    ? h('button', { type: 'button', class: 'quiet show-all', on: { click: () => showAll(hit, answer, all) } }, 'Show all of this answer')
    : null;
  return h(
    'li',
    { class: 'hit' },
    h('p', { class: 'meta' }, h('span', {}, hit.wave), ' · ', h('span', {}, hit.respondent), ' · ', h('span', { class: 'question' }, hit.question)),
    answer,
    all,
    h('button', { type: 'button', class: 'quiet', on: { click: () => like(hit) } }, 'Answers like this'),
  );
}

async function showAll(hit, answer, button) {
  try {
    fill(answer, highlighted(await wholeText(hit.answer_id), hit.highlight));
    button.remove();
  } catch (e) {
    fill(button, `Show all of this answer (${e.message})`);
  }
}

function hideError() {
  els.error.hidden = true;
  clear(els.error);
  els.input.removeAttribute('aria-invalid');
}

function showError(e, q) {
  const column = e instanceof ApiError && e.where.source === 'query' ? e.where.column : 0;
  fill(els.error, h('strong', {}, column ? `Cannot read the query at column ${column}: ` : 'Cannot search: '), e.message);
  if (column && q !== null) {
    const at = Math.max(0, Math.min(column - 1, q.length));
    els.error.append(
      h('pre', { class: 'excerpt', 'aria-hidden': 'true' }, q, '\n', ' '.repeat(at) + '^'),
    );
    els.input.setAttribute('aria-invalid', 'true');
    els.input.focus();
    els.input.setSelectionRange(at, at);
  }
  els.error.hidden = false;
}
