// Coding: reading from the server. The codebook, a page of answers for the filters (or the random
// order's page), moving from answer to answer across pages, and reading the page's codes again when
// the project changed elsewhere. Only the reply to the newest request is drawn.
import { api, query } from './api.js';
import { h, fill, position } from './dom.js';
import { state, PAGE, shownCodes, readNow } from './coding-state.js';
import { renderAll, renderKeys, renderSaving } from './coding-draw.js';
import { fetchSuggestions } from './coding-suggestions.js';

export async function reloadCodes() {
  try {
    applyCodes((await api('/api/codes')).codes);
  } catch (e) {
    showFilterError('The codebook could not be read', e);
    applyCodes([]);
  }
}

function applyCodes(list) {
  const { els } = state;
  state.codes = list;
  state.byId = new Map(list.map((c) => [c.id, c]));
  state.byKey = new Map(list.filter((c) => c.key && !c.archived).map((c) => [c.key, c]));
  const chosen = els.code.value;
  fill(
    els.code,
    h('option', { value: '' }, 'Any code'),
    list.map((c) => h('option', { value: String(c.id), props: { selected: chosen === String(c.id) } }, c.archived ? `${c.name} (archived)` : c.name)),
  );
  els.bulk.fillCodes();
  renderKeys();
}

function filterParams() {
  const { els } = state;
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

export async function load(offset, index) {
  const { els } = state;
  const mine = ++state.asked;
  state.loading = true;
  els.filterError.hidden = true;
  els.query.removeAttribute('aria-invalid');
  if (!state.page) fill(els.work, h('p', { class: 'status' }, 'Reading the answers\u2026'));
  try {
    // offset null: the start (in a random order, its first unread answer).
    const next = els.order.on() ? await els.order.page(filterParams(), offset, PAGE) : await api(`/api/answers${query({ ...filterParams(), offset, limit: PAGE })}`);
    if (mine !== state.asked) return; // a newer request is on its way
    state.page = next;
    const { page } = state;
    for (const a of page.answers) a.server = a.assignments;
    state.baseRead = new Map(page.answers.map((a) => [a.id, readNow(a)]));
    state.at = Math.max(0, Math.min(index < 0 ? page.answers.length - 1 : index, page.answers.length - 1));
    state.errors.clear();
    renderAll();
    fetchSuggestions();
    if (!state.firstPaint && page.answers.length > 0) {
      state.firstPaint = true;
      performance.mark('coding-first-answer');
    }
  } catch (e) {
    if (mine !== state.asked) return;
    showFilterError('Cannot show these answers', e);
    if (e.where && e.where.source === 'query') {
      els.query.setAttribute('aria-invalid', 'true');
      els.query.focus();
      if (e.where.column > 0) els.query.setSelectionRange(e.where.column - 1, e.where.column);
    }
  } finally {
    if (mine === state.asked) state.loading = false;
  }
}

function showFilterError(what, e) {
  const { els } = state;
  const where = e.where && e.where.source === 'query' ? ` (search, ${position(e.where)})` : '';
  fill(els.filterError, h('strong', {}, `${what}${where}: `), e.message);
  els.filterError.hidden = false;
}

/** Answers on this page that no longer match the read/coded filter (they left the list). */
function leftFilter() {
  const { page } = state;
  const want = state.els.state.value;
  if (!want || !page || page.queue) return 0; // a random order keeps its answers in place
  if (want === 'no') return page.answers.filter((a) => shownCodes(a).size > 0 || readNow(a)).length;
  return page.answers.filter((a) => shownCodes(a).size === 0).length;
}

export function move(step) {
  const { page } = state;
  if (!page || state.loading || page.answers.length === 0) return;
  const next = state.at + step;
  if (next >= 0 && next < page.answers.length) {
    state.at = next;
    renderAll();
    return;
  }
  if (step > 0 && page.offset + page.answers.length < page.total) {
    load(Math.max(0, page.offset + page.answers.length - leftFilter()), 0);
  } else if (step < 0 && page.offset > 0) {
    load(Math.max(0, page.offset - PAGE), -1);
  } else {
    state.els.saving.textContent = step > 0 ? 'This is the last answer.' : 'This is the first answer.';
  }
}

// ---- changes made elsewhere ----

/**
 * The project changed, maybe elsewhere (the command line, another page): the codebook and this
 * page's codes are read again once its own changes have gone out, and redrawn only where they
 * differ from what is shown.
 */
export function changed() {
  if (!state.page) return;
  if (state.queue.length > 0 || state.sending) state.changedMeanwhile = true;
  else readAgain();
}

export async function readAgain() {
  state.changedMeanwhile = false;
  const before = state.sent;
  try {
    const book = await api('/api/codes');
    const ids = state.page.answers.map((a) => a.id);
    const got = ids.length ? await api(`/api/assignments${query({ answers: ids.join(',') })}`) : { assignments: {} };
    if (state.sent !== before || state.queue.length > 0) {
      state.changedMeanwhile = true; // this page changed something meanwhile: its replies are newer
      return;
    }
    let differs = false;
    if (JSON.stringify(book.codes) !== JSON.stringify(state.codes)) {
      applyCodes(book.codes);
      differs = true;
    }
    for (const a of state.page.answers) {
      const now = got.assignments[a.id] || [];
      if (JSON.stringify(now) !== JSON.stringify(a.server)) {
        a.server = now;
        differs = true;
      }
    }
    if (differs) renderAll();
  } catch (e) {
    state.changedMeanwhile = true; // tried again when the page is next quiet
  }
}

/** Reads the codes and read marks of the page's answers again (after undo, or a change to many). */
export async function refreshAssignments() {
  if (!state.page || state.page.answers.length === 0) return;
  try {
    const got = await api(`/api/assignments${query({ answers: state.page.answers.map((a) => a.id).join(',') })}`);
    const read = new Set(got.read);
    const marked = new Set(got.marked);
    for (const a of state.page.answers) {
      a.server = got.assignments[a.id] || [];
      a.read = read.has(a.id);
      a.marked = marked.has(a.id);
    }
    renderAll();
  } catch (e) {
    state.lastMessage = `The codes could not be read again: ${e.message}`;
    renderSaving();
  }
}
