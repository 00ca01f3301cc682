// Kept whole though over 400 lines: one flow (source, preview, roles, import) over shared state, no clean seam.
// Bringing in a wave: a file or pasted cells, a preview of how they were read, the column roles
// to check and change, the wave's name and date, then the import with its progress and problems.
import { api, ApiError } from './api.js';
import { h, fill, clear, count, plural, position } from './dom.js';

const ROLES = [
  ['text', 'Question (open text)'],
  ['id', 'Respondent id'],
  ['date', 'Answer date'],
  ['meta', 'Segment'],
  ['codes', 'Codes given elsewhere'],
  ['coder', 'Coder'],
  ['ignored', 'Leave out'],
];

const DELIMITERS = [
  ['auto', 'Detect'],
  ['comma', 'Comma ,'],
  ['semicolon', 'Semicolon ;'],
  ['tab', 'Tab'],
  ['pipe', 'Pipe |'],
];

const ENCODINGS = [
  ['auto', 'Detect'],
  ['UTF-8', 'UTF-8'],
  ['windows-1252', 'Windows-1252'],
  ['UTF-16LE', 'UTF-16 LE'],
  ['UTF-16BE', 'UTF-16 BE'],
];

const DATE_ORDERS = [
  ['auto', 'Detect'],
  ['dmy', 'Day first (31.12.2026)'],
  ['mdy', 'Month first (12/31/2026)'],
];

let ctx;
let els;
/** What is being brought in: {paste} or {upload, name}. */
let source = null;
/** The last preview, and the roles the analyst chose (by column index). */
let preview = null;
let roles = [];
let rolesChanged = false;

function options(pairs, selected) {
  return pairs.map(([value, label]) =>
    h('option', { value, props: { selected: value === selected } }, label),
  );
}

export function mount(section, context) {
  ctx = context;
  els = {};
  els.file = h('input', {
    type: 'file',
    id: 'bring-file',
    accept: '.csv,.tsv,.txt,.xlsx,.xlsm,text/csv,text/tab-separated-values,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
    on: { change: chooseFile },
  });
  els.fileError = h('div', { class: 'error', id: 'bring-file-error', role: 'alert', hidden: true });
  els.paste = h('textarea', {
    id: 'bring-paste',
    rows: 8,
    spellcheck: 'false',
    placeholder: 'respondent\tWhat almost stopped you from ordering?\n1\tNot sure it would arrive in time',
    on: { input: pasteEdited },
  });
  els.pasteError = h('div', { class: 'error', id: 'bring-paste-error', role: 'alert', hidden: true });
  els.readPaste = h('button', { type: 'button', id: 'bring-read', on: { click: readPaste } }, 'Read the pasted cells');
  els.delimiter = h('select', { id: 'bring-delimiter', on: { change: reread } }, options(DELIMITERS, 'auto'));
  els.encoding = h('select', { id: 'bring-encoding', on: { change: reread } }, options(ENCODINGS, 'auto'));
  els.dateOrder = h('select', { id: 'bring-date-order', on: { change: reread } }, options(DATE_ORDERS, 'auto'));
  els.sheet = h('input', { type: 'text', id: 'bring-sheet', autocomplete: 'off', placeholder: 'first with data', on: { change: reread } });

  els.previewBox = h('section', { class: 'panel', id: 'bring-preview', 'aria-labelledby': 'h-bring-preview', hidden: true });
  els.waveBox = h('section', { class: 'panel', id: 'bring-wave', 'aria-labelledby': 'h-bring-wave', hidden: true });

  els.wave = h('input', { type: 'text', id: 'bring-wave-name', autocomplete: 'off', required: true });
  els.waveError = h('div', { class: 'error', id: 'bring-wave-error', role: 'alert', hidden: true });
  els.date = h('input', { type: 'date', id: 'bring-date' });
  els.dateError = h('div', { class: 'error', id: 'bring-date-error', role: 'alert', hidden: true });
  els.go = h('button', { type: 'button', class: 'primary', id: 'bring-go', on: { click: startImport } }, 'Bring in the wave');
  els.progress = h('progress', { id: 'bring-progress', hidden: true });
  els.status = h('p', { class: 'status', id: 'bring-status', 'aria-live': 'polite' });
  els.importError = h('div', { class: 'error', id: 'bring-import-error', role: 'alert', hidden: true });
  els.outcome = h('div', { id: 'bring-outcome' });

  fill(
    els.waveBox,
    h('h2', { id: 'h-bring-wave' }, '3. Name the wave'),
    h(
      'div',
      { class: 'fields' },
      h('div', { class: 'field' }, h('label', { for: 'bring-wave-name' }, 'Wave name'), els.wave, els.waveError),
      h(
        'div',
        { class: 'field' },
        h('label', { for: 'bring-date' }, 'Fielded on'),
        els.date,
        h('p', { class: 'hint' }, 'Leave empty to take the latest answer date in the export.'),
        els.dateError,
      ),
    ),
    h('div', { class: 'actions' }, els.go),
    els.progress,
    els.status,
    els.importError,
    els.outcome,
  );

  fill(
    section,
    h('h1', { id: 'h-bring' }, 'Bring in a wave'),
    h('p', { class: 'lead' }, 'Upload a survey export, or paste cells copied from a spreadsheet. Nothing is stored until you bring the wave in.'),
    h(
      'section',
      { class: 'panel', 'aria-labelledby': 'h-bring-source' },
      h('h2', { id: 'h-bring-source' }, '1. The export'),
      h(
        'div',
        { class: 'two' },
        h(
          'div',
          { class: 'field' },
          h('label', { for: 'bring-file' }, 'A file (CSV, TSV or Excel .xlsx)'),
          els.file,
          els.fileError,
          h(
            'div',
            { class: 'fields' },
            h('div', { class: 'field' }, h('label', { for: 'bring-delimiter' }, 'Delimiter'), els.delimiter),
            h('div', { class: 'field' }, h('label', { for: 'bring-encoding' }, 'Encoding'), els.encoding),
            h('div', { class: 'field' }, h('label', { for: 'bring-date-order' }, 'Dates'), els.dateOrder),
            h('div', { class: 'field' }, h('label', { for: 'bring-sheet' }, 'Sheet (workbooks)'), els.sheet),
          ),
          h('p', { class: 'hint' }, 'Delimiter, encoding and date order are detected; change them when the preview looks wrong. A workbook is read from its first visible sheet with data unless you name a sheet or give its number.'),
        ),
        h(
          'div',
          { class: 'field grow' },
          h('label', { for: 'bring-paste' }, 'Or pasted cells, header row first'),
          els.paste,
          els.pasteError,
          h('div', { class: 'actions' }, els.readPaste),
        ),
      ),
    ),
    els.previewBox,
    els.waveBox,
  );
  ctx.onSummary(suggestWaveName);
}

function suggestWaveName(summary) {
  if (!els.wave.value) els.wave.value = `Wave ${summary.waves.length + 1}`;
}

function hideErrors() {
  for (const e of [els.fileError, els.pasteError, els.waveError, els.dateError, els.importError]) {
    e.hidden = true;
    clear(e);
  }
  for (const sel of els.previewBox.querySelectorAll('select[aria-invalid]')) sel.removeAttribute('aria-invalid');
  els.paste.removeAttribute('aria-invalid');
}

async function chooseFile() {
  const file = els.file.files[0];
  if (!file) return;
  hideErrors();
  els.paste.value = '';
  try {
    // The file itself is the body: the browser streams it, and the server writes it to disk.
    const receipt = await api(`/api/uploads?name=${encodeURIComponent(file.name)}`, {
      method: 'POST',
      body: file,
      raw: true,
    });
    source = { upload: receipt.upload, name: file.name };
    rolesChanged = false;
    await read();
  } catch (e) {
    showSourceError(e);
  }
}

function pasteEdited() {
  if (source && source.paste !== undefined) {
    source = null;
    preview = null;
    els.previewBox.hidden = true;
    els.waveBox.hidden = true;
  }
}

async function readPaste() {
  hideErrors();
  els.file.value = '';
  source = { paste: els.paste.value };
  rolesChanged = false;
  await read();
}

async function reread() {
  if (source) await read();
}

function request(extra = {}) {
  const body = {
    delimiter: els.delimiter.value,
    encoding: els.encoding.value,
    date_order: els.dateOrder.value,
    ...extra,
  };
  if (els.sheet.value.trim()) body.sheet = els.sheet.value.trim();
  if (source.upload) body.upload = source.upload;
  else body.paste = source.paste;
  if (rolesChanged && preview) {
    body.columns = preview.columns.map((c, i) => ({ header: c.header, role: roles[i] }));
  }
  return body;
}

async function read() {
  hideErrors();
  try {
    preview = await api('/api/import/preview', { method: 'POST', body: request({ rows: 8 }) });
    roles = preview.columns.map((c) => c.role);
    showPreview();
  } catch (e) {
    preview = null;
    els.previewBox.hidden = true;
    els.waveBox.hidden = true;
    showSourceError(e);
  }
}

/** Shows an error of reading the export beside the input it came from, with its line. */
function showSourceError(e) {
  const box = source && source.paste !== undefined ? els.pasteError : els.fileError;
  const where = e instanceof ApiError ? e.where : {};
  const at = position(where);
  fill(box, h('strong', {}, at ? `Cannot read it (${at}): ` : 'Cannot read it: '), e.message);
  if (source && source.paste !== undefined && where.line > 0) {
    const lines = source.paste.split(/\r\n|\r|\n/);
    const line = lines[where.line - 1];
    if (line !== undefined) {
      box.append(h('pre', { class: 'excerpt' }, h('span', { class: 'lineno' }, `${where.line}`), line));
      selectLine(where.line);
    }
    els.paste.setAttribute('aria-invalid', 'true');
    els.paste.setAttribute('aria-describedby', 'bring-paste-error');
  }
  box.hidden = false;
}

function selectLine(n) {
  const text = els.paste.value;
  let start = 0;
  for (let i = 1; i < n; i++) {
    const next = text.indexOf('\n', start);
    if (next < 0) return;
    start = next + 1;
  }
  let end = text.indexOf('\n', start);
  if (end < 0) end = text.length;
  els.paste.focus();
  els.paste.setSelectionRange(start, end);
}

/** "9 s", "3 min 5 s", "1 h 2 min", as the terminal writes them. */
function duration(seconds) {
  if (seconds < 60) return `${seconds} s`;
  if (seconds < 3600) return `${Math.floor(seconds / 60)} min ${seconds % 60} s`;
  return `${Math.floor(seconds / 3600)} h ${Math.floor((seconds % 3600) / 60)} min`;
}

function detectedLabel(value, detected) {
  return detected ? `${value} (detected)` : `${value} (as chosen)`;
}

function showPreview() {
  const p = preview;
  const head = h(
    'tr',
    {},
    p.columns.map((c, i) =>
      h(
        'th',
        { scope: 'col' },
        h('span', { class: 'colname', id: `bring-col-${i}` }, c.header),
        h(
          'select',
          {
            class: `role role-${roles[i]}`,
            'aria-label': `Role of column ${c.header}`,
            'data-column': c.header,
            on: { change: (e) => changeRole(i, e.target.value) },
          },
          options(ROLES, roles[i]),
        ),
        h('span', { class: 'why' }, rolesChanged ? 'as chosen' : c.reason),
      ),
    ),
  );
  const body = p.rows.map((r) =>
    h(
      'tr',
      {},
      r.cells.map((cell, i) => h('td', { class: roles[i] === 'ignored' ? 'left-out' : null, title: cell }, cell)),
    ),
  );
  const problems = p.problems.length
    ? h(
        'div',
        { class: 'problems' },
        h('h3', {}, plural(p.problems.length, 'problem') + ' found'),
        h('ul', {}, p.problems.map((x) => h('li', {}, h('span', { class: 'where' }, position(x) || x.source), ' ', x.message))),
      )
    : null;
  fill(
    els.previewBox,
    h('h2', { id: 'h-bring-preview' }, '2. Check the columns'),
    h(
      'p',
      { class: 'readas', id: 'bring-readas' },
      p.encoding === 'pasted text' ? 'Pasted text' : p.encoding.startsWith('Excel workbook') ? `Read from the ${p.encoding}` : `Read as ${detectedLabel(p.encoding, p.encoding_detected)}`,
      p.encoding.startsWith('Excel workbook') ? ' · ' : `, columns separated by ${detectedLabel(p.delimiter, p.delimiter_detected)} · `,
      h('strong', {}, plural(p.total_rows, 'row')),
      ' to bring in',
      p.skipped_rows ? ` · ${plural(p.skipped_rows, 'row')} left out` : '',
    ),
    h('p', { class: 'hint' }, 'Change a role where the guess is wrong. The first rows are shown masked.'),
    h('div', { class: 'tablewrap' }, h('table', { class: 'preview', id: 'bring-table' }, h('thead', {}, head), h('tbody', {}, body))),
    problems,
  );
  els.previewBox.hidden = false;
  els.waveBox.hidden = false;
  if (ctx.summary()) suggestWaveName(ctx.summary());
}

async function changeRole(i, role) {
  roles[i] = role;
  rolesChanged = true;
  const focused = document.activeElement?.dataset?.column;
  await read();
  if (focused) {
    const again = [...els.previewBox.querySelectorAll('select.role')].find((s) => s.dataset.column === focused);
    if (again) again.focus();
  }
}

async function startImport() {
  hideErrors();
  clear(els.outcome);
  if (!source || !preview) return;
  const wave = els.wave.value.trim();
  if (!wave) {
    fieldError(els.waveError, els.wave, 'The wave needs a name.');
    return;
  }
  rolesChanged = true; // send every role, as shown
  const body = request({ wave, date: els.date.value || null });
  els.go.disabled = true;
  els.progress.hidden = false;
  els.progress.removeAttribute('value');
  els.status.textContent = 'Starting…';
  try {
    let job = await api('/api/imports', { method: 'POST', body });
    while (job.state === 'queued' || job.state === 'running') {
      showProgress(job);
      await new Promise((r) => setTimeout(r, 200));
      job = await api(`/api/imports/${encodeURIComponent(job.job)}`);
    }
    if (job.state === 'failed') throw new ApiError(400, job.error);
    showOutcome(job.report);
    await ctx.refresh();
  } catch (e) {
    showImportError(e);
  } finally {
    els.go.disabled = false;
    els.progress.hidden = true;
  }
}

function showProgress(job) {
  if (job.total > 0) {
    els.progress.max = job.total;
    els.progress.value = job.done;
    const pace = job.pace
      ? ` · ${count(Math.round(job.pace.per_second))}/s, about ${duration(job.pace.seconds_left)} left`
      : '';
    els.status.textContent = `${job.phase}: ${count(job.done)} of ${count(job.total)}${pace}`;
  } else {
    els.progress.removeAttribute('value');
    els.status.textContent = `${job.phase}…`;
  }
}

function fieldError(box, input, message) {
  fill(box, message);
  box.hidden = false;
  input.setAttribute('aria-invalid', 'true');
  input.focus();
}

function showImportError(e) {
  els.status.textContent = '';
  const field = e.where && e.where.field;
  if (field === 'wave') return fieldError(els.waveError, els.wave, e.message);
  if (field === 'date') return fieldError(els.dateError, els.date, e.message);
  if (e.where && e.where.setting === 'date order') els.dateOrder.setAttribute('aria-invalid', 'true');
  if (field && field.startsWith('columns.')) {
    const sel = els.previewBox.querySelectorAll('select.role')[Number(field.split('.')[1])];
    if (sel) sel.setAttribute('aria-invalid', 'true');
  }
  if (e.where && e.where.line > 0) return showSourceError(e);
  fill(els.importError, h('strong', {}, 'Not brought in: '), e.message, ' Nothing was stored.');
  els.importError.hidden = false;
}

function showOutcome(r) {
  els.status.textContent = '';
  fill(
    els.outcome,
    h(
      'div',
      { class: 'done', role: 'status', id: 'bring-done', tabindex: '-1' },
      h('h3', {}, `Wave “${r.wave}” brought in`),
      h(
        'p',
        {},
        `${plural(r.answers, 'answer')} added from ${plural(r.rows, 'row')}` +
          (r.duplicates ? `, ${plural(r.duplicates, 'row')} already there` : '') +
          (r.skipped ? `, ${plural(r.skipped, 'row')} left out` : '') +
          (r.assignments ? `, ${plural(r.assignments, 'code assignment')} brought along` : '') +
          `. Fielded on ${r.fielded_on}.`,
      ),
      r.problems.length
        ? h('ul', { class: 'problems' }, r.problems.map((x) => h('li', {}, h('span', { class: 'where' }, position(x) || x.source), ' ', x.message)))
        : null,
      h('p', {}, h('a', { href: '#phrases' }, 'See its recurring phrases'), ' or ', h('a', { href: '#find' }, 'find answers'), '.'),
    ),
  );
  const done = document.getElementById('bring-done');
  done.scrollIntoView({ block: 'center' });
  done.focus({ preventScroll: true });
}
