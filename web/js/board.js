// Copy board: buyer wording ranked for each use on the left, the board's five slots on the right.
// Pin a quote, put the slots in order, write a working line beside a quote (the quote itself never
// changes and stays linked to its answer), export. Every change is the coder's own undoable edit.
import { api, query } from './api.js';
import { h, fill, plural } from './dom.js';
import { coderBar, current as coderName } from './coder.js';
import { segmentPicker } from './segments.js';

const SLOTS = [
  ['headline', 'Headline ideas'],
  ['subheadline', 'Sub-headline ideas'],
  ['benefit', 'Benefit lines'],
  ['objection', 'Objections to answer'],
  ['proof', 'Proof quotes'],
];
const LABEL = Object.fromEntries(SLOTS);

let ctx;
let els;
let board = null;

export function mount(section, context) {
  ctx = context;
  els = {};
  els.wave = h('select', { id: 'board-wave' });
  els.segment = segmentPicker('board', { ctx, wave: els.wave });
  els.filterError = h('div', { class: 'error', id: 'board-filter-error', role: 'alert', hidden: true });
  els.status = h('p', { class: 'status', id: 'board-status', 'aria-live': 'polite' });
  els.candidates = h('div', { id: 'board-candidates' });
  els.notice = h('p', { class: 'consent', id: 'board-consent', role: 'note' }, 'Quoting respondents publicly needs their consent under the local privacy law.');
  els.takenOff = h('ul', { class: 'status', id: 'board-taken-off', role: 'status', hidden: true });
  els.slots = h('div', { id: 'board-slots' });
  els.boardError = h('div', { class: 'error', id: 'board-error', role: 'alert', hidden: true });
  const form = h(
    'form',
    { class: 'filters', on: { submit: (e) => { e.preventDefault(); run(); } } },
    h('div', { class: 'field' }, h('label', { for: 'board-wave' }, 'Wave'), els.wave),
    els.segment.fields,
    h('div', { class: 'field end' }, h('button', { type: 'submit', class: 'primary', id: 'board-go' }, 'Show wording')),
  );
  const exports = h(
    'p',
    { class: 'exports', id: 'board-exports' },
    'Export the board: ',
    h('a', { href: '/api/board/export?format=md', download: 'copy-board.md', id: 'board-export-md' }, 'Markdown'),
    ' · ',
    h('a', { href: '/api/board/export?format=txt', download: 'copy-board.txt', id: 'board-export-txt' }, 'plain text'),
    ' · ',
    h('a', { href: '/api/board/export?format=csv', download: 'copy-board.csv', id: 'board-export-csv' }, 'CSV with answer ids'),
  );
  fill(
    section,
    h('h1', { id: 'h-board' }, 'Copy board'),
    h('p', { class: 'lead' }, 'Buyer wording for your pages, ranked for each use. Pin what you like (button, or p on a focused quote), order it, and write your own line beside it; the buyer\'s words stay as they were said.'),
    coderBar('board'),
    form,
    els.filterError,
    h(
      'div',
      { class: 'board-grid' },
      h('div', { class: 'board-left' }, h('h2', {}, 'Wording to pick from'), els.status, els.candidates),
      h(
        'div',
        { class: 'board-right', 'aria-labelledby': 'h-board-slots' },
        h('h2', { id: 'h-board-slots' }, 'The board'),
        els.notice,
        els.takenOff,
        els.boardError,
        els.slots,
        exports,
        h('p', { class: 'hint' }, 'On a focused quote of the board: Alt+↑ / Alt+↓ move it, Delete takes it off.'),
      ),
    ),
  );
  ctx.onSummary(fillChoices);
  loadBoard();
}

let ran = false;

export function shown() {
  loadBoard();
  if (!ran && ctx.summary() && ctx.summary().answers > 0) run();
}

function fillChoices(summary) {
  const w = els.wave.value;
  fill(els.wave, h('option', { value: '' }, 'All waves'), summary.waves.map((x) => h('option', { value: x.name, props: { selected: w === x.name } }, x.name)));
  if (!ran && !document.getElementById('screen-board').hidden && summary.answers > 0) run();
}

let asked = 0;

async function run() {
  ran = true;
  const mine = ++asked;
  els.filterError.hidden = true;
  els.segment.invalid(false);
  els.status.textContent = 'Ranking buyer wording…';
  const seg = els.segment.value.trim();
  try {
    const findings = await api(`/api/quotes${query({ wave: els.wave.value, segment: seg })}`);
    if (mine !== asked) return;
    drawCandidates(findings);
    els.status.textContent = `${plural(findings.quotes.length, 'candidate')} from ${plural(findings.codes.length, 'code')}.`;
  } catch (e) {
    if (mine !== asked) return;
    els.status.textContent = '';
    els.filterError.textContent = e.message;
    els.filterError.hidden = false;
    if (e.where.parameter === 'segment') {
      els.segment.invalid(true);
    }
  }
}

function answerLink(q) {
  const text = q.text.replaceAll('"', '');
  return h(
    'button',
    {
      type: 'button',
      class: 'link answer-link',
      title: 'Show the answer this comes from',
      on: { click: () => ctx.go('find', { q: `"${text}" AND wave:"${q.wave.replaceAll('"', '')}"` }) },
    },
    `${q.respondent} · ${q.wave}`,
  );
}

function drawCandidates(findings) {
  const groups = SLOTS.map(([slot, label]) => {
    const list = findings.quotes.filter((q) => q.slot === slot);
    return h(
      'section',
      { class: 'cand-group', 'data-slot': slot },
      h('h3', {}, label),
      list.length === 0
        ? h('p', { class: 'hint' }, 'No wording for this use with these filters.')
        : h('ol', { class: 'cands' }, list.map((q) => candidate(slot, q))),
    );
  });
  fill(els.candidates, groups);
}

function candidate(slot, q) {
  const error = h('p', { class: 'error inline', role: 'alert', hidden: true });
  const pinButton = h('button', { type: 'button', class: 'quiet pin', on: { click: () => pin(slot, q, error, pinButton) } }, `Pin to ${LABEL[slot].toLowerCase()}`);
  const item = h(
    'li',
    {
      class: 'cand',
      tabindex: '0',
      'data-answer': q.answer_id,
      on: {
        keydown: (e) => {
          if (e.target === item && (e.key === 'p' || e.key === 'P') && !e.ctrlKey && !e.metaKey && !e.altKey) {
            e.preventDefault();
            pin(slot, q, error, pinButton);
          }
        },
      },
    },
    h('blockquote', { class: 'quote-text' }, q.text),
    h(
      'p',
      { class: 'quote-meta' },
      h('span', { class: 'quote-code' }, q.code),
      q.count > 1 ? h('span', { class: 'said' }, `said this way by ${q.count} buyers`) : null,
      q.fresh ? h('span', { class: 'fresh' }, 'new this wave') : null,
      answerLink(q),
    ),
    h('div', { class: 'row' }, pinButton),
    error,
  );
  return item;
}

async function pin(slot, q, error, button) {
  error.hidden = true;
  const coder = coderName();
  if (!coder) {
    error.textContent = 'Say who you are first (above): every change carries your name.';
    error.hidden = false;
    document.getElementById('board-coder-name')?.focus();
    return;
  }
  button.disabled = true;
  try {
    const res = await api('/api/board/pin', { method: 'POST', body: { coder, slot, answer_id: q.answer_id, text: q.text, code: q.code } });
    drawBoard(res.board);
    els.boardError.hidden = true;
    error.textContent = res.outcome.message;
    error.classList.add('ok');
    error.hidden = false;
  } catch (e) {
    error.classList.remove('ok');
    error.textContent = `Could not pin: ${e.message}`;
    error.hidden = false;
  } finally {
    button.disabled = false;
  }
}

async function loadBoard() {
  try {
    drawBoard(await api('/api/board'));
  } catch (e) {
    els.boardError.textContent = `The board could not be read: ${e.message}`;
    els.boardError.hidden = false;
  }
}

function drawBoard(b, focus) {
  board = b;
  els.notice.textContent = b.consent_notice;
  const off = b.taken_off || [];
  fill(els.takenOff, off.map((t) => h('li', {}, t)));
  els.takenOff.hidden = off.length === 0;
  fill(
    els.slots,
    b.slots.map((s) =>
      h(
        'section',
        { class: 'slot', 'data-slot': s.slot, 'aria-label': LABEL[s.slot] },
        h('h3', {}, LABEL[s.slot], h('span', { class: 'slot-count' }, ` (${s.items.length})`)),
        s.items.length === 0
          ? h('p', { class: 'hint' }, 'Nothing pinned yet.')
          : h('ol', { class: 'pinned' }, s.items.map((item, i) => pinned(s.slot, i, s.items.length, item))),
      ),
    ),
  );
  if (focus) {
    const el = els.slots.querySelector(`.slot[data-slot="${focus.slot}"] .pinned > li:nth-child(${focus.index + 1})`);
    (el?.querySelector(focus.selector) || el)?.focus();
  }
}

function pinned(slot, index, size, item) {
  const error = h('p', { class: 'error inline', role: 'alert', hidden: true });
  const fail = (what) => (e) => {
    error.textContent = `Could not ${what}: ${e.message}`;
    error.hidden = false;
  };
  const line = h('input', {
    type: 'text',
    class: 'working-line',
    id: `board-line-${slot}-${index}`,
    maxlength: '1000',
    placeholder: 'Your line, in your words',
    autocomplete: 'off',
    props: { value: item.working_line || '' },
  });
  const saveLine = () => {
    if (line.value.trim() === (item.working_line || '')) return;
    change('/api/board/line', { slot, index, line: line.value }, { slot, index, selector: '.working-line' }).catch(fail('save the line'));
  };
  line.addEventListener('change', saveLine);
  line.addEventListener('keydown', (e) => {
    if (e.key === 'Enter') {
      e.preventDefault();
      saveLine();
    }
  });
  const moveTo = h(
    'select',
    { class: 'move-to', id: `board-move-${slot}-${index}`, 'aria-label': 'Move to another slot' },
    SLOTS.filter(([s]) => s !== slot).map(([s, label]) => h('option', { value: s }, label)),
  );
  const up = () => change('/api/board/move', { slot, from: index, to_slot: slot, place: index - 1 }, { slot, index: index - 1, selector: '.up' }).catch(fail('move it'));
  const down = () => change('/api/board/move', { slot, from: index, to_slot: slot, place: index + 1 }, { slot, index: index + 1, selector: '.down' }).catch(fail('move it'));
  const unpin = () => change('/api/board/unpin', { slot, index }, null).catch(fail('take it off'));
  const li = h(
    'li',
    {
      class: 'pinned-item',
      tabindex: '0',
      'data-answer': item.answer_id,
      on: {
        keydown: (e) => {
          if (e.target.closest('input, select')) return;
          if (e.altKey && e.key === 'ArrowUp' && index > 0) { e.preventDefault(); up(); }
          else if (e.altKey && e.key === 'ArrowDown' && index < size - 1) { e.preventDefault(); down(); }
          else if (e.key === 'Delete' && e.target === li) { e.preventDefault(); unpin(); }
        },
      },
    },
    h('blockquote', { class: 'quote-text' }, item.text),
    h(
      'p',
      { class: 'quote-meta' },
      h('span', { class: 'quote-code' }, item.code),
      answerLink(item),
    ),
    h('label', { for: line.id, class: 'small' }, 'Working line'),
    line,
    h(
      'div',
      { class: 'row item-actions' },
      h('button', { type: 'button', class: 'quiet up', 'aria-label': 'Move up', title: 'Move up', disabled: index === 0, on: { click: up } }, '↑'),
      h('button', { type: 'button', class: 'quiet down', 'aria-label': 'Move down', title: 'Move down', disabled: index === size - 1, on: { click: down } }, '↓'),
      moveTo,
      h('button', { type: 'button', class: 'quiet move', on: { click: () => change('/api/board/move', { slot, from: index, to_slot: moveTo.value, place: 1_000_000 }, null).catch(fail('move it')) } }, 'Move'),
      h('button', { type: 'button', class: 'quiet unpin', on: { click: unpin } }, 'Take off'),
    ),
    error,
  );
  return li;
}

async function change(path, body, focus) {
  const coder = coderName();
  if (!coder) throw new Error('say who you are first (above): every change carries your name');
  const res = await api(path, { method: 'POST', body: { coder, ...body } });
  drawBoard(res.board, focus);
  return res;
}
