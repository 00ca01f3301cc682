// The segment picker of the coding, phrases, findings and copy-board screens: a column, then one of
// its values with its answers and read base ("mobile — 412 answers, 120 read"), from
// /api/segments (values merged as the findings merge them). It gives the same segment=COL=VAL the
// screens send; the findings screen uses the column alone (segment=COL) to split its shares.
import { api, query } from './api.js';
import { h, fill, count, plural } from './dom.js';

/**
 * A picker. prefix: the screen's id prefix (ids `${prefix}-segment-column`, `${prefix}-segment`);
 * ctx: the page's context (the list is read again when the project's counts change); wave and
 * question: the screen's selects, whose values limit the counts; values: false for a column
 * choice only; onChange: called after the user changes the choice.
 */
export function segmentPicker(prefix, { ctx, wave = null, question = null, values = true, onChange = () => {} }) {
  const column = h('select', { id: `${prefix}-segment-column`, on: { change: () => { fillValues(); onChange(); } } }, h('option', { value: '' }, 'Everyone'));
  const value = h('select', { id: `${prefix}-segment`, disabled: true, on: { change: () => onChange() } }, h('option', { value: '' }, 'every value'));
  let columns = [];
  let asked = 0;

  function fillValues() {
    const keep = value.value;
    const c = columns.find((x) => x.column === column.value);
    value.disabled = !c;
    fill(
      value,
      h('option', { value: '' }, c ? 'every value' : '\u2014'),
      (c ? c.values : []).map((v) =>
        h(
          'option',
          { value: v.filterable ? v.value : '', disabled: !v.filterable, class: v.small_base ? 'small-base' : null, props: { selected: v.filterable && keep === v.value } },
          label(v),
        ),
      ),
    );
  }

  async function load() {
    const mine = ++asked;
    let got;
    try {
      got = await api(`/api/segments${query({ question: question ? question.value : '', wave: wave ? wave.value : '' })}`);
    } catch (e) {
      return; // the screen's own request reports what is wrong with its question or wave
    }
    if (mine !== asked) return;
    columns = got.columns;
    const keep = column.value;
    fill(
      column,
      h('option', { value: '' }, columns.length ? 'Everyone' : 'no segment columns'),
      columns.map((c) => h('option', { value: c.column, props: { selected: keep === c.column } }, c.column)),
    );
    if (keep && !columns.some((c) => c.column === keep)) {
      // Gone with this question or wave: say so rather than quietly showing everyone.
      column.append(h('option', { value: keep, props: { selected: true } }, `${keep} (not in these answers)`));
    }
    if (values) fillValues();
  }

  // Counts change as answers are read: read again when the project's counts do, but only on the
  // screen in view (the others when they are shown), so each computation is one a person sees.
  let stale = false;
  const inView = () => column.isConnected && column.closest('section[hidden]') === null;
  const whenInView = () => {
    if (inView()) {
      stale = false;
      load();
    } else stale = true;
  };
  for (const select of [wave, question]) if (select) select.addEventListener('change', load);
  if (ctx) ctx.onSummary(whenInView);
  queueMicrotask(whenInView); // once the screen has put the picker in the page
  window.addEventListener('hashchange', () => {
    if (stale) whenInView();
  });

  const fields = [
    h('div', { class: 'field' }, h('label', { for: column.id }, 'Segment'), column),
    values ? h('div', { class: 'field' }, h('label', { for: value.id }, 'Value'), value) : null,
  ];
  return {
    fields,
    load,
    /** The segment as COL=VAL, or '' for everyone (every value). */
    get value() {
      return values && column.value && value.value ? `${column.value}=${value.value}` : '';
    },
    /** The column alone, or ''. */
    get column() {
      return column.value;
    },
    /** Marks the choice as refused by the server (or not), and puts the focus on it. */
    invalid(on) {
      if (on) {
        column.setAttribute('aria-invalid', 'true');
        column.focus();
      } else column.removeAttribute('aria-invalid');
    },
  };
}

/** "mobile — 412 answers, 120 read" (and "small base" under 30 read). */
export function label(v) {
  const read = v.read === 0 ? 'none read' : `${count(v.read)} read`;
  const cannot = v.filterable ? '' : ' (cannot be picked)';
  return `${v.value} \u2014 ${plural(v.answers, 'answer')}, ${read}${v.small_base ? ', small base' : ''}${cannot}`;
}
