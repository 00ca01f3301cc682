// Coding: giving a code to all answers of the search (previewed first, with a sample), and
// accepting the page's suggestions above a chosen certainty.
import { api } from './api.js';
import { h, fill, count, plural } from './dom.js';
import { current as coderName } from './coder.js';
import { state } from './coding-state.js';
import { requireCoder } from './coding-changes.js';
import { refreshAssignments } from './coding-load.js';

/** The "All at once" panel. Returns { panel, fillCodes() }. */
export function bulkPanel() {
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
          if (!state.page || !state.page.query) {
            fill(out, h('p', { class: 'error' }, 'Search or filter first: the code goes to the answers the filters show.'));
            return;
          }
          if (!code.value) {
            fill(out, h('p', { class: 'error' }, 'Pick the code to give.'));
            return;
          }
          fill(out, h('p', { class: 'status' }, 'Counting\u2026'));
          try {
            const p = await api('/api/assignments/bulk/preview', { method: 'POST', body: { code: Number(code.value), query: state.page.query, sample: 3 } });
            previewed = { code: Number(code.value), query: state.page.query };
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
      state.done.length = 0;
      refreshAssignments();
      state.ctx.refresh();
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
          if (!state.page || !requireCoder()) return;
          try {
            const r = await api('/api/suggestions/accept-above', { method: 'POST', body: { coder: coderName(), answers: state.page.answers.map((a) => a.id), above: Number(threshold.value) } });
            fill(acceptOut, h('p', { class: 'done' }, r.message));
            state.done.length = 0;
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
      fill(code, h('option', { value: '' }, 'Pick a code'), state.codes.filter((c) => !c.archived).map((c) => h('option', { value: String(c.id), props: { selected: was === String(c.id) } }, c.name)));
    },
  };
}
