// The coding screen's state, in one place: every coding-*.js module reads and changes this one
// object, and nothing else of the screen lives at module level. What the page shows of an answer is
// the server's codes with the queued changes replayed on them (the functions below).

export const PAGE = 50;
// "Read, no code applies": a key no code can have (code keys are letters and digits).
export const READ_KEY = '.';
export const NONE = 'read-mark'; // the guess's code for the read mark

export const state = {
  ctx: null, // the page's context (app.js)
  els: null, // the screen's elements, made once by mount()
  codes: [], // the codebook, in order
  byKey: new Map(), // key → code
  byId: new Map(), // id → code
  page: null, // {query, total, coded, offset, answers}
  baseRead: new Map(), // answer id → whether it was read when the page came
  at: 0, // index of the current answer in page.answers
  view: 'focus',
  loading: false,
  asked: 0, // answer pages asked for so far (only the newest is drawn)
  firstPaint: false,
  suggestions: new Map(), // answer id → [{code_id, code, confidence}]
  suggestState: { ready: false, training: false, examples: 0 },
  suggestTimer: 0,
  // The queue of changes, sent one at a time in the order they were made.
  queue: [],
  sending: false,
  done: [], // this page's own changes, newest last, for predicting undo
  undone: [],
  errors: new Map(), // answer id → message of a refused change
  lastMessage: '',
  quietTimer: 0,
  sent: 0, // changes handed to the server so far
  changedMeanwhile: false,
};

export function currentAnswer() {
  return state.page && state.page.answers[state.at];
}

/** Map code id → {span, origin, pending} for an answer. */
export function shownCodes(answer) {
  const out = new Map();
  for (const a of answer.server) out.set(a.code_id, { span: a.span, origin: a.origin, pending: false });
  for (const op of state.queue) applyGuess(out, op, answer.id);
  return out;
}

function applyGuess(shown, op, answerId) {
  for (const g of op.guess || []) {
    if (g.answer !== answerId || g.code === NONE) continue;
    if (g.after) shown.set(g.code, { ...g.after, pending: true });
    else shown.delete(g.code);
  }
}

/** Whether the answer carries the "read, no code applies" mark, queued changes replayed. */
export function shownMarked(answer) {
  let marked = !!answer.marked;
  for (const op of state.queue) for (const g of op.guess || []) if (g.answer === answer.id && g.code === NONE) marked = !!g.after;
  return marked;
}

/** Whether a person has read the answer: the server says so, or a change of this page makes it. */
export function readNow(answer) {
  if (answer.read || shownMarked(answer)) return true;
  return state.queue.some((op) => op.answer === answer.id && op.kind !== 'none-off');
}
