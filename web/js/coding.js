// Coding: answers one at a time (or as a list), codes toggled by their keys. Every change shows at
// once (the page updates itself first) and is sent in order through one queue; the server's answer
// then replaces the page's guess. A change that fails is retried, and if the server refuses it the
// reason appears on the answer it concerned.
import { api, query, wholeText } from './api.js';
import { h, fill, count, plural, position } from './dom.js';
import { coderBar, current as coderName, onCoder } from './coder.js';
import { orderChoice } from './queue.js';
import { segmentPicker } from './segments.js';

const PAGE = 50;
const RESERVED = new Set(['j', 'k', 'z']);
// "Read, no code applies": a key no code can have (code keys are letters and digits).
const READ_KEY = '.';
const NONE = 'read-mark'; // the guess's code for the read mark

let ctx;
let els;
let codes = []; // the codebook, in order
let byKey = new Map(); // key → code
let byId = new Map(); // id → code
let page = null; // {query, total, coded, offset, answers}
let baseRead = new Map(); // answer id → whether it was read when the page came
let at = 0; // index of the current answer in page.answers
let view = 'focus';
let loading = false;
let suggestions = new Map(); // answer id → [{code_id, code, confidence}]
let suggestState = { ready: false, training: false, examples: 0 };
let firstPaint = false;

// The queue of changes, sent one at a time in the order they were made.
const queue = [];
let sending = false;
const done = []; // this page's own changes, newest last, for predicting undo
const undone = [];
const errors = new Map(); // answer id → message of a refused change

export function mount(section, context) {
  ctx = context;
  els = {};
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
  els.segment = segmentPicker('coding', { ctx, wave: els.wave, question: els.question });
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
    if (queue.length > 0) {
      e.preventDefault();
      e.returnValue = '';
    }
  });
  onCoder(() => renderAll());
  ctx.onSummary(fillChoices);
  reloadCodes().then(() => load(0, 0));
}

function field(id, label, control) {
  return h('div', { class: 'field' }, h('label', { for: id }, label), control);
}

function keyHelp() {
  return h(
    'details',
    { class: 'keyhelp', id: 'coding-keyhelp', open: true },
    h('summary', {}, 'Keys'),
    h(
      'dl',
      {},
      [
        ['a code\u2019s key', 'give it to the answer, or take it off'],
        ['select words, then the key', 'give the code to those words'],
        ['j  or  \u2193 \u2192', 'next answer'],
        ['k  or  \u2191 \u2190', 'previous answer'],
        ['Enter', 'accept the top suggestion'],
        [READ_KEY, 'read: no (other) code applies; again to take the mark off'],
        ['z  /  Shift+z', 'undo / redo your last change'],
        ['/', 'search these answers'],
        ['Esc', 'leave the search, back to the answer'],
      ].map(([k, what]) => [h('dt', {}, k), h('dd', {}, what)]),
    ),
  );
}

export function shown() {
  // The codebook may have changed on its own screen.
  if (page) reloadCodes().then(() => renderAll());
  focusWork();
}

/** Focuses the search field ( / on this screen). */
export function slash() {
  els.query.focus();
  els.query.select();
}

function focusWork() {
  if (!document.getElementById('screen-coding').hidden) els.work.focus({ preventScroll: true });
}

function fillChoices(summary) {
  const w = els.wave.value;
  const q = els.question.value;
  fill(els.wave, h('option', { value: '' }, 'All waves'), summary.waves.map((x) => h('option', { value: x.name, props: { selected: w === x.name } }, x.name)));
  fill(
    els.question,
    h('option', { value: '' }, 'All questions'),
    summary.questions.map((text, i) => h('option', { value: String(i + 1), props: { selected: q === String(i + 1) } }, `${i + 1}. ${text}`)),
  );
}

async function reloadCodes() {
  try {
    applyCodes((await api('/api/codes')).codes);
  } catch (e) {
    showFilterError('The codebook could not be read', e);
    applyCodes([]);
  }
}

function applyCodes(list) {
  codes = list;
  byId = new Map(codes.map((c) => [c.id, c]));
  byKey = new Map(codes.filter((c) => c.key && !c.archived).map((c) => [c.key, c]));
  const chosen = els.code.value;
  fill(
    els.code,
    h('option', { value: '' }, 'Any code'),
    codes.map((c) => h('option', { value: String(c.id), props: { selected: chosen === String(c.id) } }, c.archived ? `${c.name} (archived)` : c.name)),
  );
  els.bulk.fillCodes();
  renderKeys();
}

// ---- loading answers ----

function filterParams() {
  const seg = els.segment.value.trim();
  return {
    wave: els.wave.value,
    question: els.question.value,
    coded: els.state.value,
    code: els.code.value,
    segment: seg || undefined,
    q: els.query.value.trim(),
  };
}

let asked = 0;

async function load(offset, index) {
  const mine = ++asked;
  loading = true;
  els.filterError.hidden = true;
  els.query.removeAttribute('aria-invalid');
  if (!page) fill(els.work, h('p', { class: 'status' }, 'Reading the answers\u2026'));
  try {
    // offset null: the start (in a random order, its first unread answer).
    const next = els.order.on() ? await els.order.page(filterParams(), offset, PAGE) : await api(`/api/answers${query({ ...filterParams(), offset, limit: PAGE })}`);
    if (mine !== asked) return; // a newer request is on its way
    page = next;
    for (const a of page.answers) a.server = a.assignments;
    baseRead = new Map(page.answers.map((a) => [a.id, readNow(a)]));
    at = Math.max(0, Math.min(index < 0 ? page.answers.length - 1 : index, page.answers.length - 1));
    errors.clear();
    renderAll();
    fetchSuggestions();
    if (!firstPaint && page.answers.length > 0) {
      firstPaint = true;
      performance.mark('coding-first-answer');
    }
  } catch (e) {
    if (mine !== asked) return;
    showFilterError('Cannot show these answers', e);
    if (e.where && e.where.source === 'query') {
      els.query.setAttribute('aria-invalid', 'true');
      els.query.focus();
      if (e.where.column > 0) els.query.setSelectionRange(e.where.column - 1, e.where.column);
    }
  } finally {
    if (mine === asked) loading = false;
  }
}

function showFilterError(what, e) {
  const where = e.where && e.where.source === 'query' ? ` (search, ${position(e.where)})` : '';
  fill(els.filterError, h('strong', {}, `${what}${where}: `), e.message);
  els.filterError.hidden = false;
}

/** Answers on this page that no longer match the read/coded filter (they left the list). */
function leftFilter() {
  const want = els.state.value;
  if (!want || !page || page.queue) return 0; // a random order keeps its answers in place
  if (want === 'no') return page.answers.filter((a) => shownCodes(a).size > 0 || readNow(a)).length;
  return page.answers.filter((a) => shownCodes(a).size === 0).length;
}

function move(step) {
  if (!page || loading || page.answers.length === 0) return;
  const next = at + step;
  if (next >= 0 && next < page.answers.length) {
    at = next;
    renderAll();
    return;
  }
  if (step > 0 && page.offset + page.answers.length < page.total) {
    load(Math.max(0, page.offset + page.answers.length - leftFilter()), 0);
  } else if (step < 0 && page.offset > 0) {
    load(Math.max(0, page.offset - PAGE), -1);
  } else {
    els.saving.textContent = step > 0 ? 'This is the last answer.' : 'This is the first answer.';
  }
}

function currentAnswer() {
  return page && page.answers[at];
}

// ---- what the page shows: the server's codes with the queued changes replayed on them ----

/** Map code id → {span, origin, pending} for an answer. */
function shownCodes(answer) {
  const out = new Map();
  for (const a of answer.server) out.set(a.code_id, { span: a.span, origin: a.origin, pending: false });
  for (const op of queue) applyGuess(out, op, answer.id);
  return out;
}

function applyGuess(state, op, answerId) {
  for (const g of op.guess || []) {
    if (g.answer !== answerId || g.code === NONE) continue;
    if (g.after) state.set(g.code, { ...g.after, pending: true });
    else state.delete(g.code);
  }
}

/** Whether the answer carries the "read, no code applies" mark, queued changes replayed. */
function shownMarked(answer) {
  let marked = !!answer.marked;
  for (const op of queue) for (const g of op.guess || []) if (g.answer === answer.id && g.code === NONE) marked = !!g.after;
  return marked;
}

/** Whether a person has read the answer: the server says so, or a change of this page makes it. */
function readNow(answer) {
  if (answer.read || shownMarked(answer)) return true;
  return queue.some((op) => op.answer === answer.id && op.kind !== 'none-off');
}

// ---- keys ----

function typing(target) {
  return target.closest('input, textarea, select, [contenteditable]') !== null;
}

function onKey(e) {
  if (document.getElementById('screen-coding').hidden) return;
  if (e.ctrlKey || e.metaKey || e.altKey) return;
  if (typing(e.target)) {
    if (e.key === 'Escape') {
      e.target.blur();
      focusWork();
    }
    return;
  }
  if (e.target.closest('button, a, summary') && (e.key === 'Enter' || e.key === ' ')) return;
  const key = e.key;
  if (key === 'j' || key === 'ArrowDown' || key === 'ArrowRight') {
    e.preventDefault();
    move(1);
  } else if (key === 'k' || key === 'ArrowUp' || key === 'ArrowLeft') {
    e.preventDefault();
    move(-1);
  } else if (key === 'z' || key === 'Z') {
    e.preventDefault();
    if (e.shiftKey || key === 'Z') redo();
    else undo();
  } else if (key === READ_KEY) {
    e.preventDefault();
    toggleRead(currentAnswer());
  } else if (key === 'Enter') {
    const top = topSuggestion(currentAnswer());
    if (top) {
      e.preventDefault();
      accept(currentAnswer(), top);
    }
  } else if (key.length === 1 && byKey.has(key.toLowerCase()) && !RESERVED.has(key.toLowerCase())) {
    e.preventDefault();
    toggle(currentAnswer(), byKey.get(key.toLowerCase()));
  }
}

/** The selected words inside the shown answer, as offsets into its text, or null. */
function selectedSpan() {
  const sel = window.getSelection();
  const text = document.getElementById('coding-text');
  if (!sel || sel.isCollapsed || sel.rangeCount === 0 || !text) return null;
  const range = sel.getRangeAt(0);
  if (!text.contains(range.startContainer) || !text.contains(range.endContainer)) return null;
  const before = document.createRange();
  before.selectNodeContents(text);
  before.setEnd(range.startContainer, range.startOffset);
  let start = before.toString().length;
  let end = start + range.toString().length;
  const full = text.textContent;
  while (start < end && /\s/.test(full[start])) start++;
  while (end > start && /\s/.test(full[end - 1])) end--;
  return end > start ? { start, end } : null;
}

// ---- changes ----

function requireCoder() {
  if (coderName()) return true;
  document.getElementById('coding-coder-name')?.focus();
  return false;
}

function toggle(answer, code) {
  if (!answer || !requireCoder()) return;
  const span = view === 'focus' ? selectedSpan() : null;
  const state = shownCodes(answer);
  const had = state.get(code.id);
  if (span) {
    const after = { span, origin: had ? had.origin : 'manual' };
    enqueue({ kind: 'assign', answer: answer.id, code: code.id, span, label: `mark \u201c${code.name}\u201d`, guess: [{ answer: answer.id, code: code.id, before: had || null, after }] });
    window.getSelection().removeAllRanges();
  } else if (had) {
    enqueue({ kind: 'remove', answer: answer.id, code: code.id, label: `take \u201c${code.name}\u201d off`, guess: [{ answer: answer.id, code: code.id, before: had, after: null }] });
  } else {
    enqueue({ kind: 'assign', answer: answer.id, code: code.id, label: `give \u201c${code.name}\u201d`, guess: [{ answer: answer.id, code: code.id, before: null, after: { span: null, origin: 'manual' } }] });
  }
}

function toggleRead(answer) {
  if (!answer || !requireCoder()) return;
  if (shownMarked(answer)) {
    enqueue({ kind: 'none-off', answer: answer.id, label: 'take the read mark off', guess: [{ answer: answer.id, code: NONE, before: true, after: null }] });
  } else {
    enqueue({ kind: 'none', answer: answer.id, label: 'mark it as read', guess: [{ answer: answer.id, code: NONE, before: null, after: true }] });
  }
}

function accept(answer, suggestion) {
  if (!answer || !requireCoder()) return;
  enqueue({ kind: 'accept', answer: answer.id, code: suggestion.code_id, label: `accept \u201c${suggestion.code}\u201d`, guess: [{ answer: answer.id, code: suggestion.code_id, before: null, after: { span: null, origin: 'suggestion' } }] });
}

function undo() {
  if (!requireCoder()) return;
  const last = done.pop();
  const guess = last ? last.guess.map((g) => ({ answer: g.answer, code: g.code, before: g.after, after: g.before })) : [];
  if (last) undone.push(last);
  enqueue({ kind: 'undo', label: 'undo', guess, undoes: last }, false);
}

function redo() {
  if (!requireCoder()) return;
  const last = undone.pop();
  if (last) done.push(last);
  enqueue({ kind: 'redo', label: 'redo', guess: last ? last.guess : [], redoes: last }, false);
}

function enqueue(op, fresh = true) {
  op.tries = 0;
  queue.push(op);
  if (fresh) {
    done.push(op);
    undone.length = 0;
  }
  if (op.answer) errors.delete(op.answer);
  renderChanged(op);
  send();
}

function renderChanged(op) {
  const ids = new Set((op.guess || []).map((g) => g.answer));
  if (op.answer) ids.add(op.answer);
  if (ids.size === 0 || (op.kind === 'undo' || op.kind === 'redo')) renderAll();
  else for (const id of ids) renderAnswer(id);
  renderProgress();
  renderSaving();
}

async function send() {
  if (sending) return;
  sending = true;
  try {
    while (queue.length > 0) {
      const op = queue[0];
      try {
        const result = await deliver(op);
        queue.shift();
        settle(op, result);
      } catch (e) {
        if ((e.status === 0 || e.status === 503 || e.status >= 500) && op.tries < 5) {
          op.tries++;
          renderSaving(`Saving did not work (${e.message}); trying again\u2026`);
          await new Promise((r) => setTimeout(r, 250 * 2 ** op.tries));
          continue;
        }
        queue.shift();
        refused(op, e);
      }
    }
  } finally {
    sending = false;
    renderSaving();
    afterQuiet();
  }
}

function deliver(op) {
  sent++;
  const coder = coderName();
  switch (op.kind) {
    case 'assign':
      return api('/api/assignments', { method: 'POST', body: { coder, answer: op.answer, code: op.code, span: op.span || null } });
    case 'remove':
      return api('/api/assignments/remove', { method: 'POST', body: { coder, answer: op.answer, code: op.code } });
    case 'accept':
      return api('/api/assignments/accept', { method: 'POST', body: { coder, answer: op.answer, code: op.code } });
    case 'none':
      return api('/api/answers/read', { method: 'POST', body: { coder, answer: op.answer } });
    case 'none-off':
      return api('/api/answers/read/remove', { method: 'POST', body: { coder, answer: op.answer } });
    case 'undo':
      return api('/api/undo', { method: 'POST', body: { coder } });
    case 'redo':
      return api('/api/redo', { method: 'POST', body: { coder } });
    default:
      return Promise.reject(new Error(`unknown change ${op.kind}`));
  }
}

function settle(op, result) {
  if (op.kind === 'undo' || op.kind === 'redo') {
    lastMessage = result.message;
    for (const g of op.guess || []) {
      const answer = page && page.answers.find((a) => a.id === g.answer);
      if (!answer) continue;
      if (g.code === NONE) {
        answer.marked = !!g.after;
        continue;
      }
      const rest = answer.server.filter((a) => a.code_id !== g.code);
      if (g.after) rest.push({ answer_id: g.answer, code_id: g.code, span: g.after.span, origin: g.after.origin });
      answer.server = rest;
    }
    renderAll();
    // Undo may reach further than this page knows (another tab, the codebook): read the page's
    // codes again.
    refreshAssignments();
    return;
  }
  const answer = page && page.answers.find((a) => a.id === op.answer);
  if (answer) {
    answer.server = result.assignments;
    answer.read = result.read;
    answer.marked = result.marked;
  }
  if (result.outcome.edit === 0) {
    const i = done.indexOf(op);
    if (i >= 0) done.splice(i, 1);
  }
  lastMessage = result.outcome.message;
  renderAnswer(op.answer);
  renderProgress();
}

function refused(op, e) {
  const i = done.indexOf(op);
  if (i >= 0) done.splice(i, 1);
  const message = `Could not ${op.label}: ${e.message}`;
  if (op.answer) errors.set(op.answer, message);
  lastMessage = message;
  if (op.answer) renderAnswer(op.answer);
  else renderAll();
  renderProgress();
}

let lastMessage = '';
let quietTimer = 0;

function afterQuiet() {
  clearTimeout(quietTimer);
  quietTimer = setTimeout(() => {
    if (queue.length === 0) {
      fetchSuggestions();
      els.order.refresh();
      ctx.refresh();
      if (changedMeanwhile) readAgain();
    }
  }, 800);
}

// ---- changes made elsewhere ----

let sent = 0; // changes handed to the server so far
let changedMeanwhile = false;

/**
 * The project changed, maybe elsewhere (the command line, another page): the codebook and this
 * page's codes are read again once its own changes have gone out, and redrawn only where they
 * differ from what is shown.
 */
export function changed() {
  if (!page) return;
  if (queue.length > 0 || sending) changedMeanwhile = true;
  else readAgain();
}

async function readAgain() {
  changedMeanwhile = false;
  const before = sent;
  try {
    const book = await api('/api/codes');
    const ids = page.answers.map((a) => a.id);
    const got = ids.length ? await api(`/api/assignments${query({ answers: ids.join(',') })}`) : { assignments: {} };
    if (sent !== before || queue.length > 0) {
      changedMeanwhile = true; // this page changed something meanwhile: its replies are newer
      return;
    }
    let differs = false;
    if (JSON.stringify(book.codes) !== JSON.stringify(codes)) {
      applyCodes(book.codes);
      differs = true;
    }
    for (const a of page.answers) {
      const now = got.assignments[a.id] || [];
      if (JSON.stringify(now) !== JSON.stringify(a.server)) {
        a.server = now;
        differs = true;
      }
    }
    if (differs) renderAll();
  } catch (e) {
    changedMeanwhile = true; // tried again when the page is next quiet
  }
}

async function refreshAssignments() {
  if (!page || page.answers.length === 0) return;
  try {
    const got = await api(`/api/assignments${query({ answers: page.answers.map((a) => a.id).join(',') })}`);
    const read = new Set(got.read);
    const marked = new Set(got.marked);
    for (const a of page.answers) {
      a.server = got.assignments[a.id] || [];
      a.read = read.has(a.id);
      a.marked = marked.has(a.id);
    }
    renderAll();
  } catch (e) {
    lastMessage = `The codes could not be read again: ${e.message}`;
    renderSaving();
  }
}

// ---- suggestions ----

let suggestTimer = 0;

async function fetchSuggestions() {
  clearTimeout(suggestTimer);
  if (!page || page.answers.length === 0) return;
  const asked = page;
  try {
    const got = await api(`/api/suggestions${query({ answers: page.answers.map((a) => a.id).join(',') })}`);
    if (asked !== page) return;
    suggestState = got;
    suggestions = new Map();
    for (const s of got.suggestions) {
      if (!suggestions.has(s.answer_id)) suggestions.set(s.answer_id, []);
      suggestions.get(s.answer_id).push(s);
    }
    for (const list of suggestions.values()) list.sort((a, b) => b.confidence - a.confidence);
    renderAnswer(currentAnswer()?.id);
    // Training runs in the background; look again while it does.
    if (got.training || !got.ready) {
      suggestTimer = setTimeout(() => {
        if (!document.getElementById('screen-coding').hidden) fetchSuggestions();
      }, 2000);
    }
  } catch (e) {
    suggestState = { ready: false, training: false, problem: e.message };
  }
}

function shownSuggestions(answer) {
  if (!answer) return [];
  const has = shownCodes(answer);
  return (suggestions.get(answer.id) || []).filter((s) => !has.has(s.code_id) && byId.has(s.code_id) && !byId.get(s.code_id).archived);
}

function topSuggestion(answer) {
  return shownSuggestions(answer)[0] || null;
}

// ---- drawing ----

function setView(v) {
  view = v;
  els.viewFocus.setAttribute('aria-pressed', String(v === 'focus'));
  els.viewList.setAttribute('aria-pressed', String(v === 'list'));
  renderAll();
  focusWork();
}

function renderAll() {
  if (!els) return;
  renderKeys();
  renderProgress();
  renderSaving();
  if (!page) return;
  if (page.answers.length === 0) {
    fill(els.work, h('div', { class: 'empty' }, h('p', {}, 'No answer matches these filters.'), h('p', {}, codes.length === 0 ? 'Start by adding codes on the Codebook screen.' : 'Change the filters above, or clear the search.')));
    return;
  }
  if (view === 'focus') {
    fill(els.work, focusCard(currentAnswer()));
  } else {
    const list = h('ol', { class: 'coding-list', id: 'coding-list' }, page.answers.map((a, i) => listRow(a, i)));
    fill(els.work, list);
    list.children[at]?.scrollIntoView({ block: 'nearest' });
  }
}

function renderAnswer(id) {
  if (!page || id === undefined) return;
  const i = page.answers.findIndex((a) => a.id === id);
  if (i < 0) return;
  if (view === 'focus') {
    if (i === at) fill(els.work, focusCard(page.answers[i]));
  } else {
    const list = document.getElementById('coding-list');
    const old = list && list.children[i];
    if (old) old.replaceWith(listRow(page.answers[i], i));
  }
}

function codeChip(code, state) {
  const chip = h(
    'li',
    { class: `chip${state.pending ? ' pending' : ''}`, 'data-code': String(code.id), title: state.pending ? 'saving\u2026' : `${state.origin}` },
    code.key ? h('kbd', {}, code.key) : null,
    h('span', { class: 'chip-name' }, code.name),
    state.origin === 'suggestion' ? h('span', { class: 'chip-origin' }, 'accepted') : null,
    state.origin === 'rule' ? h('span', { class: 'chip-origin' }, 'by rule') : null,
    state.span ? h('span', { class: 'chip-origin' }, 'words marked') : null,
  );
  if (code.colour) chip.style.setProperty('--code-colour', code.colour);
  return chip;
}

function chips(answer, id) {
  const state = shownCodes(answer);
  const list = h('ul', { class: 'chips', id, 'aria-label': 'Codes of this answer' });
  for (const c of codes) {
    if (state.has(c.id)) list.append(codeChip(c, state.get(c.id)));
  }
  if (state.size === 0) list.append(h('li', { class: 'chip none' }, readNow(answer) ? 'read: no code applies' : 'no code yet'));
  return list;
}

/** The answer's text with the marked words of its codes wrapped in <mark>, as text nodes. */
function answerText(answer, id) {
  const state = shownCodes(answer);
  const spans = [];
  for (const [codeId, s] of state) if (s.span) spans.push({ ...s.span, code: byId.get(codeId) });
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
      errors.delete(answer.id);
    } catch (err) {
      errors.set(answer.id, `Could not show the whole answer: ${err.message}`);
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
  const n = page.offset + at + 1;
  const error = errors.get(answer.id);
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

function suggestionBox(answer) {
  const list = shownSuggestions(answer);
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

function listRow(answer, i) {
  const error = errors.get(answer.id);
  return h(
    'li',
    {
      class: `coding-row${i === at ? ' current' : ''}`,
      'data-answer': String(answer.id),
      'aria-current': i === at ? 'true' : null,
      on: { click: () => { at = i; renderAll(); } },
    },
    h('p', { class: 'meta' }, `${count(page.offset + i + 1)} \u00b7 `, meta(answer)),
    h('p', { class: 'answer-text' }, answer.text),
    showAll(answer),
    chips(answer, i === at ? 'coding-codes' : null),
    error ? h('p', { class: 'error', role: 'alert' }, error) : null,
  );
}

function renderKeys() {
  // Codes with a key first (they are the ones a coder presses), each group in codebook order.
  const active = [...codes.filter((c) => !c.archived && c.key), ...codes.filter((c) => !c.archived && !c.key)];
  const answer = currentAnswer();
  const state = answer ? shownCodes(answer) : new Map();
  fill(
    els.keys,
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
                class: `keybtn${state.has(c.id) ? ' on' : ''}`,
                'aria-pressed': String(state.has(c.id)),
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
  if (!page) return 0;
  let n = page.read;
  for (const a of page.answers) {
    if (!a.substantive) continue;
    const now = readNow(a);
    const was = baseRead.get(a.id);
    if (now && !was) n++;
    if (!now && was) n--;
  }
  return Math.max(0, Math.min(n, page.substantive));
}

function renderProgress() {
  if (!page) return;
  const read = readCount();
  const apart = page.total - page.substantive;
  const pct = page.substantive ? ` (${Math.round((100 * read) / page.substantive)}%)` : '';
  els.progress.textContent = `Read ${count(read)} of ${plural(page.substantive, 'answer')}${pct}${apart ? ` \u00b7 ${plural(apart, 'non-answer')} apart` : ''}`;
  els.bar.max = Math.max(1, page.substantive);
  els.bar.value = read;
  renderKeys();
}

function renderSaving(note) {
  if (!els) return;
  const n = queue.length;
  els.saving.textContent = note || (n > 0 ? `Saving ${plural(n, 'change')}\u2026` : lastMessage ? `Saved. ${lastMessage}` : '');
  els.saving.classList.toggle('busy', n > 0);
}

// ---- giving a code to all answers of the search ----

function bulkPanel() {
  const code = h('select', { id: 'coding-bulk-code' });
  const out = h('div', { id: 'coding-bulk-out', 'aria-live': 'polite' });
  const go = h('button', { type: 'button', class: 'primary', id: 'coding-bulk-go', hidden: true }, 'Give it');
  let previewed = null;
  const preview = h(
    'button',
    {
      type: 'button',
      class: 'quiet',
      id: 'coding-bulk-preview',
      on: {
        click: async () => {
          go.hidden = true;
          previewed = null;
          if (!page || !page.query) {
            fill(out, h('p', { class: 'error' }, 'Search or filter first: the code goes to the answers the filters show.'));
            return;
          }
          if (!code.value) {
            fill(out, h('p', { class: 'error' }, 'Pick the code to give.'));
            return;
          }
          fill(out, h('p', { class: 'status' }, 'Counting\u2026'));
          try {
            const p = await api('/api/assignments/bulk/preview', { method: 'POST', body: { code: Number(code.value), query: page.query, sample: 3 } });
            previewed = { code: Number(code.value), query: page.query };
            fill(
              out,
              h('p', {}, `${plural(p.would_code, 'answer')} would get \u201c${p.code}\u201d`, p.already_coded ? `; ${count(p.already_coded)} have it already` : '', p.kept_off ? `; ${count(p.kept_off)} left alone (a person took it off)` : '', '.'),
              p.sample.length ? h('ul', { class: 'sample' }, p.sample.map((s) => h('li', {}, s.truncated ? `${s.text}\u2026` : s.text))) : null,
            );
            go.textContent = `Give it to ${plural(p.would_code, 'answer')}`;
            go.hidden = p.would_code === 0;
          } catch (e) {
            fill(out, h('p', { class: 'error', role: 'alert' }, `Cannot count them: ${e.message}`));
          }
        },
      },
    },
    'Preview',
  );
  go.addEventListener('click', async () => {
    if (!previewed || !requireCoder()) return;
    go.disabled = true;
    try {
      const r = await api('/api/assignments/bulk', { method: 'POST', body: { coder: coderName(), code: previewed.code, query: previewed.query } });
      fill(out, h('p', { class: 'done' }, r.message, ' Press z to take it back.'));
      go.hidden = true;
      done.length = 0;
      refreshAssignments();
      ctx.refresh();
    } catch (e) {
      fill(out, h('p', { class: 'error', role: 'alert' }, `Not given: ${e.message}`));
    } finally {
      go.disabled = false;
    }
  });
  const threshold = h('select', { id: 'coding-accept-above' }, [0.95, 0.9, 0.8].map((x) => h('option', { value: String(x), props: { selected: x === 0.9 } }, `${Math.round(x * 100)}% sure or more`)));
  const acceptOut = h('div', { id: 'coding-accept-out', 'aria-live': 'polite' });
  const acceptGo = h(
    'button',
    {
      type: 'button',
      class: 'quiet',
      id: 'coding-accept-go',
      on: {
        click: async () => {
          if (!page || !requireCoder()) return;
          try {
            const r = await api('/api/suggestions/accept-above', { method: 'POST', body: { coder: coderName(), answers: page.answers.map((a) => a.id), above: Number(threshold.value) } });
            fill(acceptOut, h('p', { class: 'done' }, r.message));
            done.length = 0;
            refreshAssignments();
          } catch (e) {
            fill(acceptOut, h('p', { class: 'error', role: 'alert' }, `Not accepted: ${e.message}`));
          }
        },
      },
    },
    'Accept on this page',
  );
  const panel = h(
    'section',
    { class: 'bulk', 'aria-labelledby': 'h-coding-bulk' },
    h('h2', { id: 'h-coding-bulk' }, 'All at once'),
    h('label', { for: 'coding-bulk-code' }, 'Give a code to every answer shown by the filters'),
    h('div', { class: 'row' }, code, preview),
    out,
    go,
    h('label', { for: 'coding-accept-above' }, 'Accept suggestions'),
    h('div', { class: 'row' }, threshold, acceptGo),
    acceptOut,
  );
  return {
    panel,
    fillCodes() {
      const was = code.value;
      fill(code, h('option', { value: '' }, 'Pick a code'), codes.filter((c) => !c.archived).map((c) => h('option', { value: String(c.id), props: { selected: was === String(c.id) } }, c.name)));
    },
  };
}

/** The codebook changed elsewhere (the codebook screen): read it again. */
export function codebookChanged() {
  reloadCodes().then(() => renderAll());
}
