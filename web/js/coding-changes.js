// Coding: the queue of changes to answers. Every change shows at once (the page updates itself
// first) and is sent in order through one queue; the server's answer then replaces the page's guess.
// A change that fails is retried, and if the server refuses it the reason appears on the answer it
// concerned.
import { api } from './api.js';
import { current as coderName } from './coder.js';
import { state, NONE, shownCodes, shownMarked } from './coding-state.js';
import { renderAll, renderAnswer, renderProgress, renderSaving } from './coding-draw.js';
import { readAgain, refreshAssignments } from './coding-load.js';
import { fetchSuggestions } from './coding-suggestions.js';

/** Whether a coder has said who they are; if not, the focus goes to the question. */
export function requireCoder() {
  if (coderName()) return true;
  document.getElementById('coding-coder-name')?.focus();
  return false;
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

/** Gives the code to the answer (to the selected words, if any), or takes it off. */
export function toggle(answer, code) {
  if (!answer || !requireCoder()) return;
  const span = state.view === 'focus' ? selectedSpan() : null;
  const shown = shownCodes(answer);
  const had = shown.get(code.id);
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

/** Puts the "read, no code applies" mark on the answer, or takes it off. */
export function toggleRead(answer) {
  if (!answer || !requireCoder()) return;
  if (shownMarked(answer)) {
    enqueue({ kind: 'none-off', answer: answer.id, label: 'take the read mark off', guess: [{ answer: answer.id, code: NONE, before: true, after: null }] });
  } else {
    enqueue({ kind: 'none', answer: answer.id, label: 'mark it as read', guess: [{ answer: answer.id, code: NONE, before: null, after: true }] });
  }
}

export function accept(answer, suggestion) {
  if (!answer || !requireCoder()) return;
  enqueue({ kind: 'accept', answer: answer.id, code: suggestion.code_id, label: `accept \u201c${suggestion.code}\u201d`, guess: [{ answer: answer.id, code: suggestion.code_id, before: null, after: { span: null, origin: 'suggestion' } }] });
}

export function undo() {
  if (!requireCoder()) return;
  const last = state.done.pop();
  const guess = last ? last.guess.map((g) => ({ answer: g.answer, code: g.code, before: g.after, after: g.before })) : [];
  if (last) state.undone.push(last);
  enqueue({ kind: 'undo', label: 'undo', guess, undoes: last }, false);
}

export function redo() {
  if (!requireCoder()) return;
  const last = state.undone.pop();
  if (last) state.done.push(last);
  enqueue({ kind: 'redo', label: 'redo', guess: last ? last.guess : [], redoes: last }, false);
}

function enqueue(op, fresh = true) {
  op.tries = 0;
  state.queue.push(op);
  if (fresh) {
    state.done.push(op);
    state.undone.length = 0;
  }
  if (op.answer) state.errors.delete(op.answer);
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
  if (state.sending) return;
  state.sending = true;
  const { queue } = state;
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
    state.sending = false;
    renderSaving();
    afterQuiet();
  }
}

function deliver(op) {
  state.sent++;
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
  const { page } = state;
  if (op.kind === 'undo' || op.kind === 'redo') {
    state.lastMessage = result.message;
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
    const i = state.done.indexOf(op);
    if (i >= 0) state.done.splice(i, 1);
  }
  state.lastMessage = result.outcome.message;
  renderAnswer(op.answer);
  renderProgress();
}

function refused(op, e) {
  const i = state.done.indexOf(op);
  if (i >= 0) state.done.splice(i, 1);
  const message = `Could not ${op.label}: ${e.message}`;
  if (op.answer) state.errors.set(op.answer, message);
  state.lastMessage = message;
  if (op.answer) renderAnswer(op.answer);
  else renderAll();
  renderProgress();
}

function afterQuiet() {
  clearTimeout(state.quietTimer);
  state.quietTimer = setTimeout(() => {
    if (state.queue.length === 0) {
      fetchSuggestions();
      state.els.order.refresh();
      state.ctx.refresh();
      if (state.changedMeanwhile) readAgain();
    }
  }, 800);
}
