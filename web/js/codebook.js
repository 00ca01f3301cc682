// Codebook: codes with their guidance, colour, key, theme and direction; merging, splitting,
// archiving and reordering; rules (saved queries) with a preview of what they would code.
import { api, query } from './api.js';
import { h, fill, count, plural, position } from './dom.js';
import { coderBar, current as coderName } from './coder.js';

const DIRECTIONS = [
  ['neutral', 'Neutral'],
  ['friction', 'Friction (put buyers off)'],
  ['praise', 'Praise (drew buyers in)'],
];

let ctx;
let els;
let codes = [];
let uses = {};
let rules = [];
let editing = null; // the code being edited, or null for a new one

export function mount(section, context) {
  ctx = context;
  els = {};
  els.status = h('p', { class: 'status', id: 'codebook-status', 'aria-live': 'polite' });
  els.form = h('form', { class: 'panel code-form', id: 'codebook-form', on: { submit: (e) => { e.preventDefault(); save(); } } });
  els.table = h('div', { id: 'codebook-table' });
  els.merge = h('div', { class: 'merge', id: 'codebook-merge' });
  els.rules = h('section', { class: 'panel', id: 'codebook-rules', 'aria-labelledby': 'h-rules' });
  els.split = h('div', { id: 'codebook-split' });
  fill(
    section,
    h('h1', { id: 'h-codebook' }, 'Codebook'),
    h('p', { class: 'lead' }, 'The codes you give answers, grouped under themes. Give each code a key to toggle it while coding; a rule is a saved search that gives its code to every answer it finds.'),
    coderBar('codebook'),
    els.form,
    els.status,
    els.table,
    els.merge,
    els.split,
    els.rules,
  );
  renderForm();
  load();
}

export function shown() {
  if (els) load();
}

async function load() {
  try {
    const [book, r] = await Promise.all([api('/api/codes'), api('/api/rules')]);
    codes = book.codes;
    uses = book.uses;
    rules = r.rules;
    renderTable();
    renderRules();
    if (!editing) renderForm();
  } catch (e) {
    els.status.textContent = `The codebook could not be read: ${e.message}`;
  }
}

function coder() {
  const name = coderName();
  if (!name) document.getElementById('codebook-coder-name')?.focus();
  return name;
}

function name(id) {
  const c = codes.find((x) => x.id === id);
  return c ? c.name : `code ${id}`;
}

// ---- the form: a new code, or the one being edited ----

function renderForm() {
  const c = editing;
  const f = {};
  const text = (id, label, value, attrs = {}) => {
    f[id] = h('input', { type: 'text', id: `code-${id}`, value: value || '', autocomplete: 'off', ...attrs });
    return h('div', { class: 'field' }, h('label', { for: `code-${id}` }, label), f[id]);
  };
  const area = (id, label, value) => {
    f[id] = h('textarea', { id: `code-${id}`, rows: '2' });
    f[id].value = value || '';
    return h('div', { class: 'field wide' }, h('label', { for: `code-${id}` }, label), f[id]);
  };
  f.parent = h(
    'select',
    { id: 'code-parent' },
    h('option', { value: '' }, 'None (a top-level code)'),
    codes.filter((x) => x.parent === null && (!c || x.id !== c.id)).map((x) => h('option', { value: x.name, props: { selected: c && c.parent === x.id } }, x.name)),
  );
  f.direction = h('select', { id: 'code-direction' }, DIRECTIONS.map(([v, label]) => h('option', { value: v, props: { selected: (c ? c.direction : 'neutral') === v } }, label)));
  f.error = h('div', { class: 'error', id: 'codebook-form-error', role: 'alert', hidden: true });
  els.fields = f;
  fill(
    els.form,
    h('h2', { id: 'h-code-form' }, c ? `Edit \u201c${c.name}\u201d` : 'New code'),
    f.error,
    h(
      'div',
      { class: 'form-grid' },
      text('name', 'Name', c && c.name, { required: true, maxlength: '80' }),
      text('key', 'Key', c && c.key, { maxlength: '1', class: 'key-input', 'aria-describedby': 'code-key-hint' }),
      text('colour', 'Colour', c && c.colour, { placeholder: '#3a7d44', maxlength: '7', class: 'colour-input' }),
      h('div', { class: 'field' }, h('label', { for: 'code-parent' }, 'Theme'), f.parent),
      h('div', { class: 'field' }, h('label', { for: 'code-direction' }, 'Direction'), f.direction),
    ),
    h('p', { class: 'hint', id: 'code-key-hint' }, 'Key: one letter or digit; j, k and z move and undo while coding.'),
    h('div', { class: 'form-grid three' }, area('description', 'Description', c && c.description), area('include', 'Belongs here', c && c.include), area('exclude', 'Does not belong here', c && c.exclude)),
    h(
      'div',
      { class: 'actions' },
      h('button', { type: 'submit', class: 'primary', id: 'codebook-save' }, c ? 'Save changes' : 'Add code'),
      c ? h('button', { type: 'button', class: 'quiet', on: { click: () => { editing = null; renderForm(); } } }, 'Cancel') : null,
    ),
  );
}

async function save() {
  const f = els.fields;
  const who = coder();
  if (!who) return;
  const body = {
    coder: who,
    name: f.name.value.trim(),
    key: f.key.value.trim().toLowerCase(),
    colour: f.colour.value.trim(),
    parent: f.parent.value,
    direction: f.direction.value,
    description: f.description.value.trim(),
    include: f.include.value.trim(),
    exclude: f.exclude.value.trim(),
  };
  f.error.hidden = true;
  for (const el of [f.name, f.key, f.colour]) el.removeAttribute('aria-invalid');
  try {
    const r = editing
      ? await api(`/api/codes/${editing.id}`, { method: 'PATCH', body })
      : await api('/api/codes', { method: 'POST', body });
    els.status.textContent = r.message;
    editing = null;
    await load();
    renderForm();
    els.fields.name.focus();
    ctx.refresh();
  } catch (e) {
    fill(f.error, h('strong', {}, 'Not saved: '), e.message);
    f.error.hidden = false;
    const m = e.message.toLowerCase();
    const bad = m.includes('key') ? f.key : m.includes('colour') ? f.colour : f.name;
    bad.setAttribute('aria-invalid', 'true');
    bad.focus();
  }
}

// ---- the table of codes ----

function renderTable() {
  if (codes.length === 0) {
    fill(els.table, h('div', { class: 'empty' }, h('p', {}, 'No codes yet. Add the first with the form.'), h('p', {}, 'The Phrases screen proposes codes from what buyers keep saying.')));
    fill(els.merge);
    return;
  }
  const ruleCount = new Map();
  for (const r of rules) ruleCount.set(r.code_id, (ruleCount.get(r.code_id) || 0) + 1);
  const row = (c, i) => {
    const swatch = c.colour ? h('span', { class: 'swatch', 'aria-hidden': 'true' }) : null;
    if (swatch) swatch.style.setProperty('--code-colour', c.colour);
    return h(
      'tr',
      { 'data-code': String(c.id), class: c.archived ? 'archived' : '' },
      h('td', {}, h('input', { type: 'checkbox', class: 'pick', 'aria-label': `Pick \u201c${c.name}\u201d to merge`, value: String(c.id) })),
      h('td', { class: 'num' }, String(i + 1)),
      h('td', {}, c.key ? h('kbd', {}, c.key) : ''),
      h('th', { scope: 'row', class: c.parent !== null ? 'child' : '' }, swatch, c.name, c.archived ? h('span', { class: 'tag' }, 'archived') : null, c.imported ? h('span', { class: 'tag' }, 'imported') : null),
      h('td', {}, c.direction),
      h('td', { class: 'num' }, count(uses[c.id] || 0)),
      h('td', { class: 'num' }, count(ruleCount.get(c.id) || 0)),
      h(
        'td',
        { class: 'row-actions' },
        button('Edit', `Edit \u201c${c.name}\u201d`, () => { editing = c; renderForm(); els.form.scrollIntoView({ block: 'start' }); els.fields.name.focus({ preventScroll: true }); }),
        button('\u2191', `Move \u201c${c.name}\u201d up`, () => change(`/api/codes/${c.id}/move`, { place: i })),
        button('\u2193', `Move \u201c${c.name}\u201d down`, () => change(`/api/codes/${c.id}/move`, { place: i + 2 })),
        button(c.archived ? 'Bring back' : 'Archive', `${c.archived ? 'Bring back' : 'Archive'} \u201c${c.name}\u201d`, () => change(`/api/codes/${c.id}/archive`, { archived: !c.archived })),
        button('Split\u2026', `Split \u201c${c.name}\u201d`, () => splitForm(c)),
        button('Delete', `Delete \u201c${c.name}\u201d`, () => change(`/api/codes/${c.id}/remove`, {})),
      ),
    );
  };
  fill(
    els.table,
    h(
      'div',
      { class: 'tablewrap' },
      h(
        'table',
        { class: 'codebook', id: 'codebook-codes' },
        h('thead', {}, h('tr', {}, h('th', { scope: 'col' }, h('span', { class: 'visually-hidden' }, 'Pick')), h('th', { scope: 'col', class: 'num' }, '#'), h('th', { scope: 'col' }, 'Key'), h('th', { scope: 'col' }, 'Code'), h('th', { scope: 'col' }, 'Direction'), h('th', { scope: 'col', class: 'num' }, 'Answers'), h('th', { scope: 'col', class: 'num' }, 'Rules'), h('th', { scope: 'col' }, 'Change'))),
        h('tbody', {}, codes.map(row)),
      ),
    ),
  );
  const into = h('select', { id: 'codebook-merge-into' }, codes.filter((c) => !c.archived).map((c) => h('option', { value: String(c.id) }, c.name)));
  fill(
    els.merge,
    h('label', { for: 'codebook-merge-into' }, 'Merge the picked codes into'),
    h(
      'div',
      { class: 'row' },
      into,
      h(
        'button',
        {
          type: 'button',
          class: 'quiet',
          id: 'codebook-merge-go',
          on: {
            click: () => {
              const picked = [...els.table.querySelectorAll('input.pick:checked')].map((x) => Number(x.value)).filter((id) => id !== Number(into.value));
              if (picked.length === 0) {
                els.status.textContent = 'Pick the codes to merge with their boxes first (other than the one they go into).';
                return;
              }
              change('/api/codes/merge', { codes: picked, into: Number(into.value) });
            },
          },
        },
        'Merge',
      ),
    ),
  );
}

function button(label, aria, fn) {
  return h('button', { type: 'button', class: 'quiet small', 'aria-label': aria, on: { click: fn } }, label);
}

async function change(path, body) {
  const who = coder();
  if (!who) return;
  try {
    const r = await api(path, { method: 'POST', body: { coder: who, ...body } });
    els.status.textContent = r.message;
    await load();
    ctx.refresh();
  } catch (e) {
    els.status.textContent = `Not done: ${e.message}`;
  }
}

// ---- splitting ----

function splitForm(c) {
  const nameInput = h('input', { type: 'text', id: 'codebook-split-name', autocomplete: 'off' });
  const q = h('input', { type: 'text', id: 'codebook-split-query', autocomplete: 'off', spellcheck: 'false', placeholder: '"delivery date"' });
  const out = h('div', { 'aria-live': 'polite' });
  const go = h('button', { type: 'button', class: 'primary', hidden: true }, 'Split');
  const preview = async () => {
    go.hidden = true;
    try {
      const p = await api(`/api/answers${query({ code: c.id, q: q.value.trim(), limit: 3 })}`);
      fill(out, h('p', {}, `${plural(p.total, 'answer')} with \u201c${c.name}\u201d match: they move to the new code.`), h('ul', { class: 'sample' }, p.answers.map((a) => h('li', {}, a.text))));
      go.hidden = p.total === 0 || !q.value.trim();
    } catch (e) {
      fill(out, h('p', { class: 'error', role: 'alert' }, `${e.message}${e.where && e.where.column ? ` (${position(e.where)})` : ''}`));
    }
  };
  go.addEventListener('click', async () => {
    await change(`/api/codes/${c.id}/split`, { code: { name: nameInput.value.trim() }, query: q.value.trim() });
    fill(els.split);
  });
  fill(
    els.split,
    h(
      'form',
      { class: 'panel', id: 'codebook-split-form', on: { submit: (e) => { e.preventDefault(); preview(); } } },
      h('h2', {}, `Split \u201c${c.name}\u201d`),
      h('div', { class: 'field' }, h('label', { for: 'codebook-split-name' }, 'New code'), nameInput),
      h('div', { class: 'field' }, h('label', { for: 'codebook-split-query' }, 'Answers to move (a search)'), q),
      h('div', { class: 'actions' }, h('button', { type: 'submit', class: 'quiet' }, 'Preview'), go, h('button', { type: 'button', class: 'quiet', on: { click: () => fill(els.split) } }, 'Cancel')),
      out,
    ),
  );
  nameInput.focus();
}

// ---- rules ----

function renderRules() {
  const code = h('select', { id: 'rule-code' }, codes.filter((c) => !c.archived).map((c) => h('option', { value: String(c.id) }, c.name)));
  const q = h('input', { type: 'text', id: 'rule-query', autocomplete: 'off', spellcheck: 'false', placeholder: '"delivery date" AND NOT price' });
  const out = h('div', { id: 'rule-preview', 'aria-live': 'polite' });
  const save = h('button', { type: 'button', class: 'primary', id: 'rule-save', hidden: true }, 'Save rule and apply it');
  let previewed = null;
  const preview = async () => {
    save.hidden = true;
    q.removeAttribute('aria-invalid');
    if (!code.value || !q.value.trim()) {
      fill(out, h('p', { class: 'error', role: 'alert' }, 'Pick a code and write the search that finds its answers.'));
      return;
    }
    fill(out, h('p', { class: 'status' }, 'Counting\u2026'));
    try {
      const p = await api('/api/rules/preview', { method: 'POST', body: { code: Number(code.value), query: q.value.trim(), sample: 5 } });
      previewed = { code: Number(code.value), query: p.query };
      fill(
        out,
        h('p', { id: 'rule-preview-count' }, `${plural(p.matches, 'answer')} match; ${count(p.would_code)} would get \u201c${p.code}\u201d, ${count(p.already_coded)} have it already, ${count(p.kept_off)} stay without it (a person took it off).`),
        p.sample.length ? h('ul', { class: 'sample' }, p.sample.map((s) => h('li', {}, s.truncated ? `${s.text}\u2026` : s.text))) : null,
      );
      save.hidden = false;
    } catch (e) {
      q.setAttribute('aria-invalid', 'true');
      fill(out, h('p', { class: 'error', role: 'alert' }, `${e.message}${e.where && e.where.column ? ` (${position(e.where)})` : ''}`));
    }
  };
  save.addEventListener('click', async () => {
    const who = coder();
    if (!who || !previewed) return;
    try {
      await api('/api/rules', { method: 'POST', body: { coder: who, code: previewed.code, query: previewed.query } });
      const r = await api('/api/rules/apply', { method: 'POST', body: { coder: who, code: previewed.code } });
      els.status.textContent = r.message;
      await load();
      ctx.refresh();
    } catch (e) {
      fill(out, h('p', { class: 'error', role: 'alert' }, `Not saved: ${e.message}`));
    }
  });
  fill(
    els.rules,
    h('h2', { id: 'h-rules' }, 'Rules'),
    rules.length === 0
      ? h('p', { class: 'hint' }, 'No rules yet. A rule runs again on every wave you bring in; answers a person took a code off stay without it.')
      : h(
          'ul',
          { class: 'rules', id: 'rule-list' },
          rules.map((r) => h('li', {}, h('strong', {}, name(r.code_id)), ' \u2190 ', h('code', {}, r.query), h('span', { class: 'meta' }, ` saved by ${r.author}`), ' ', button('Delete', `Delete the rule ${r.query}`, () => change(`/api/rules/${r.id}/remove`, {})))),
        ),
    rules.length ? h('button', { type: 'button', class: 'quiet', id: 'rule-apply-all', on: { click: () => change('/api/rules/apply', {}) } }, 'Apply every rule now') : null,
    h(
      'form',
      { class: 'fields', on: { submit: (e) => { e.preventDefault(); preview(); } } },
      h('div', { class: 'field' }, h('label', { for: 'rule-code' }, 'Code'), code),
      h('div', { class: 'field grow' }, h('label', { for: 'rule-query' }, 'Search'), q),
      h('div', { class: 'field end' }, h('button', { type: 'submit', class: 'quiet', id: 'rule-preview-go' }, 'Preview')),
    ),
    out,
    save,
  );
}
