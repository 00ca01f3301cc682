// Coding: answers one at a time (or as a list), codes toggled by their keys. This module builds
// the screen and answers app.js; its parts live beside it: coding-state.js (the screen's one state
// object), coding-load.js (reading answers and codes), coding-changes.js (the queue of changes),
// coding-keys.js (the keyboard), coding-suggestions.js, coding-bulk.js (all at once) and
// coding-draw.js (drawing).
import { h, fill, questionOptions } from './dom.js';
import { coderBar, onCoder } from './coder.js';
import { orderChoice } from './queue.js';
import { segmentPicker } from './segments.js';
import { state } from './coding-state.js';
import { load, reloadCodes } from './coding-load.js';
import { keyHelp, onKey } from './coding-keys.js';
import { bulkPanel } from './coding-bulk.js';
import { focusWork, renderAll, setView } from './coding-draw.js';

export { changed } from './coding-load.js';

export function mount(section, context) {
  state.ctx = context;
  const els = {};
  state.els = els;
  els.wave = h('select', { id: 'coding-wave' });
  els.question = h('select', { id: 'coding-question' });
  els.state = h(
    'select',
    { id: 'coding-state' },
    h('option', { value: '' }, 'All answers'),
    h('option', { value: 'no' }, 'Not read yet'),
    h('option', { value: 'yes' }, 'Coded'),
  );
  els.code = h('select', { id: 'coding-code' });
  els.segment = segmentPicker('coding', { ctx: context, wave: els.wave, question: els.question });
  els.query = h('input', { type: 'search', id: 'coding-query', placeholder: 'delivery AND NOT price', autocomplete: 'off', spellcheck: 'false' });
  els.filterError = h('div', { class: 'error', id: 'coding-filter-error', role: 'alert', hidden: true });
  els.progress = h('p', { class: 'coding-progress', id: 'coding-progress', 'aria-live': 'polite' });
  els.bar = h('progress', { id: 'coding-bar', max: '1', value: '0' });
  els.saving = h('p', { class: 'status', id: 'coding-saving', 'aria-live': 'polite' });
  els.work = h('div', { class: 'coding-work', id: 'coding-work', tabindex: '-1', 'aria-label': 'Answers to code' });
  els.keys = h('div', { class: 'coding-keys', id: 'coding-keys' });
  els.viewFocus = h('button', { type: 'button', class: 'quiet', id: 'coding-view-focus', 'aria-pressed': 'true', on: { click: () => setView('focus') } }, 'One at a time');
  els.viewList = h('button', { type: 'button', class: 'quiet', id: 'coding-view-list', 'aria-pressed': 'false', on: { click: () => setView('list') } }, 'List');
  els.bulk = bulkPanel();
  els.order = orderChoice(() => load(null, 0).then(focusWork));

  const filters = h(
    'form',
    { class: 'filters', id: 'coding-filters', on: { submit: (e) => { e.preventDefault(); load(null, 0).then(focusWork); } } },
    field('coding-wave', 'Wave', els.wave),
    field('coding-question', 'Question', els.question),
    field('coding-state', 'Show', els.state),
    field('coding-code', 'With code', els.code),
    els.segment.fields,
    els.order.field,
    h('div', { class: 'field grow' }, h('label', { for: 'coding-query' }, 'Search ', h('kbd', {}, '/')), els.query),
    h('div', { class: 'field end' }, h('button', { type: 'submit', class: 'primary', id: 'coding-go' }, 'Show answers')),
  );
  fill(
    section,
    h('h1', { id: 'h-coding' }, 'Coding'),
    coderBar('coding'),
    filters,
    els.filterError,
    h('div', { class: 'coding-head' }, h('div', { class: 'coding-count' }, els.progress, els.bar, els.order.status), h('div', { class: 'coding-views', role: 'group', 'aria-label': 'Show answers' }, els.viewFocus, els.viewList)),
    h('div', { class: 'coding-layout' }, h('div', {}, els.work, els.saving), h('aside', { class: 'coding-side', 'aria-label': 'Codes and keys' }, els.keys, keyHelp(), els.bulk.panel)),
  );
  document.addEventListener('keydown', onKey);
  window.addEventListener('beforeunload', (e) => {
    if (state.queue.length > 0) {
      e.preventDefault();
      e.returnValue = '';
    }
  });
  onCoder(() => renderAll());
  context.onSummary(fillChoices);
  reloadCodes().then(() => load(0, 0));
}

function field(id, label, control) {
  return h('div', { class: 'field' }, h('label', { for: id }, label), control);
}

export function shown() {
  // The codebook may have changed on its own screen.
  if (state.page) reloadCodes().then(() => renderAll());
  focusWork();
}

/** Focuses the search field ( / on this screen). */
export function slash() {
  state.els.query.focus();
  state.els.query.select();
}

function fillChoices(summary) {
  const { els } = state;
  const w = els.wave.value;
  const q = els.question.value;
  fill(els.wave, h('option', { value: '' }, 'All waves'), summary.waves.map((x) => h('option', { value: x.name, props: { selected: w === x.name } }, x.name)));
  fill(
    els.question,
    h('option', { value: '' }, 'All questions'),
    questionOptions(summary, q),
  );
}
