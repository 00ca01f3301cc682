// Findings: per question, what changed between waves in words first (numbers beside them), each
// code's share over the waves with its interval, the codes that come together, and whether coding
// has found (nearly) all the codes there are. The charts are drawn in findings-charts.js.
import { api, query } from './api.js';
import { h, fill, count, plural, questionOptions } from './dom.js';
import { segmentPicker } from './segments.js';
import { svg, shareChart, heatmap, saturation, pct, pValue, projection } from './findings-charts.js';

let ctx;
let els;

export function mount(section, context) {
  ctx = context;
  els = {};
  els.question = h('select', { id: 'findings-question' });
  els.from = h('select', { id: 'findings-from' });
  els.to = h('select', { id: 'findings-to' });
  els.segment = segmentPicker('findings', { ctx, question: els.question, values: false, onChange: () => run() });
  els.error = h('div', { class: 'error', id: 'findings-error', role: 'alert', hidden: true });
  els.status = h('p', { class: 'status', id: 'findings-status', 'aria-live': 'polite' });
  els.out = h('div', { id: 'findings-out' });
  els.downloads = h('p', { class: 'downloads', id: 'findings-downloads' });
  fill(
    section,
    h('h1', { id: 'h-findings' }, 'Findings'),
    h('p', { class: 'lead' }, 'How often each theme comes up, wave by wave, with honest intervals; what rose or fell, and whether the change is real.'),
    h(
      'form',
      { class: 'filters', on: { submit: (e) => { e.preventDefault(); run(); } } },
      h('div', { class: 'field' }, h('label', { for: 'findings-question' }, 'Question'), els.question),
      h('div', { class: 'field' }, h('label', { for: 'findings-from' }, 'Compare'), els.from),
      h('div', { class: 'field' }, h('label', { for: 'findings-to' }, 'with'), els.to),
      els.segment.fields,
      h('div', { class: 'field end' }, h('button', { type: 'submit', class: 'primary', id: 'findings-go' }, 'Show findings')),
    ),
    els.downloads,
    els.error,
    els.status,
    els.out,
  );
  ctx.onSummary(fillChoices);
}

export function shown() {
  run();
}

function fillChoices(summary) {
  const q = els.question.value;
  const f = els.from.value;
  const t = els.to.value;
  fill(els.question, h('option', { value: '' }, 'All questions'), questionOptions(summary, q));
  fill(els.from, h('option', { value: '' }, 'each wave'), summary.waves.map((w) => h('option', { value: w.name, props: { selected: f === w.name } }, w.name)));
  fill(els.to, h('option', { value: '' }, 'the next'), summary.waves.map((w) => h('option', { value: w.name, props: { selected: t === w.name } }, w.name)));
}

function params() {
  return { question: els.question.value, from: els.from.value, to: els.to.value, segment: els.segment.column };
}

function renderDownloads() {
  const p = query(params());
  const link = (href, label) => h('a', { href, download: '' }, label);
  fill(
    els.downloads,
    'Download: ',
    link(`/api/report.html${p}`, 'the report (HTML)'),
    ' \u00b7 ',
    link(`/api/report.md${p}`, 'Markdown'),
    ' \u00b7 ',
    link(`/api/export/coded.csv${query({ question: els.question.value })}`, 'coded answers (CSV)'),
    ' \u00b7 ',
    link(`/api/export/coded.csv${query({ question: els.question.value, shape: 'long' })}`, 'one row per code (CSV)'),
    ' \u00b7 ',
    link(`/api/export/coded.xlsx${query({ question: els.question.value })}`, 'coded answers, codebook and findings (Excel)'),
    ' \u00b7 ',
    link('/api/export/codebook.csv', 'codebook (CSV)'),
  );
}

let asked = 0;

async function run() {
  const mine = ++asked;
  els.error.hidden = true;
  if (!!els.from.value !== !!els.to.value) {
    fill(els.error, 'Pick both waves to compare, or neither (then each wave is compared with the next).');
    els.error.hidden = false;
    return;
  }
  renderDownloads();
  els.status.textContent = 'Counting\u2026';
  try {
    const f = await api(`/api/findings${query(params())}`);
    if (mine !== asked) return; // a newer request is on its way
    els.status.textContent = '';
    fill(els.out, f.questions.map((q, i) => questionFindings(q, i, (f.question_names || {})[q.question])));
  } catch (e) {
    if (mine !== asked) return;
    els.status.textContent = '';
    fill(els.error, h('strong', {}, 'Cannot show the findings: '), e.message);
    els.error.hidden = false;
  }
}

// ---- words and numbers ----

function signed(x) {
  const v = (x * 100).toFixed(1);
  return `${x > 0 ? '+' : x < 0 ? '\u2212' : ''}${v.replace('-', '')}`;
}

function points(x) {
  return `${signed(x)} points`;
}

const ORDER = { fell: 0, rose: 1, 'no clear change': 2, 'too few answers to tell': 3 };

function sentence(c) {
  const name = `\u201c${c.code}\u201d`;
  switch (c.verdict) {
    case 'rose':
      return `${name} rose from ${c.from} to ${c.to}`;
    case 'fell':
      return `${name} fell from ${c.from} to ${c.to}`;
    case 'no clear change':
      return `${name}: no clear change from ${c.from} to ${c.to}`;
    default:
      return `${name}: too few answers to tell between ${c.from} and ${c.to}`;
  }
}

/** "read 112 of 580 (19%)" */
function coverage(c) {
  const share = c.read > 0 && c.share < 0.005 ? '<1%' : `${Math.round(c.share * 100)}%`;
  const sample = c.sample === 'random' ? ', a random sample' : c.sample === 'not_random' ? ', not a random sample' : '';
  return `read ${count(c.read)} of ${count(c.answers)} (${share})${sample}`;
}

/** What partial readings allow (the same words as the reports). */
function caution(q) {
  const samples = Object.values(q.coverage || {}).map((c) => c.sample);
  const random = samples.includes('random');
  const other = samples.includes('not_random');
  if (random && other) return 'Where the answers read are a random sample, shares are projected to the wave; elsewhere they describe the answers read only, and changes compare those.';
  if (random) return 'The answers read are a random sample: shares are projected to the wave.';
  if (other) return 'The answers read are not a random sample of the wave (choose “Random order (sample)” when coding to make one): shares describe the answers read only, are not projected to the wave, and changes compare those.';
  return null;
}

function coverageLine(q) {
  const entries = Object.entries(q.coverage || {});
  const apart = entries.reduce((n, [, c]) => n + c.non_answers, 0);
  return [entries.map(([w, c]) => `${w} ${coverage(c)}`).join(' \u00b7 '), apart ? ` (${plural(apart, 'non-answer')} counted nowhere)` : ''].join('');
}

function questionFindings(q, index, name) {
  const id = `findings-q${index + 1}`;
  const waves = Object.keys(q.bases);
  const notCompared = q.not_compared || [];
  const changes = [...q.changes].sort((a, b) => ORDER[a.verdict] - ORDER[b.verdict] || a.p_adjusted - b.p_adjusted);
  const clear = changes.filter((c) => c.verdict === 'rose' || c.verdict === 'fell');
  const rest = changes.filter((c) => c.verdict !== 'rose' && c.verdict !== 'fell');
  return h(
    'section',
    { class: 'panel findings', 'aria-labelledby': id },
    h('h2', { id }, name ? `${name}: ${q.question}` : q.question),
    h('p', { class: 'meta coverage', id: `${id}-coverage` }, 'Answers read by a person: ', coverageLine(q)),
    caution(q) ? h('p', { class: 'hint', id: `${id}-sample` }, caution(q)) : null,
    q.not_coded && q.not_coded.length > 0
      ? h('p', { class: 'hint' }, `No answer read by a person yet in ${q.not_coded.join(', ')}: codes given by hand have no share there.`)
      : null,
    h('h3', {}, 'What changed'),
    changes.length === 0
      ? h('p', { class: 'hint' }, notCompared.length ? 'No comparison can be made yet: see why below.' : waves.length < 2 ? 'One wave only: nothing to compare yet.' : 'No codes to compare yet.')
      : [
          clear.length === 0 ? h('p', { class: 'verdict none' }, 'No code rose or fell clearly.') : null,
          h('ul', { class: 'verdicts', id: `${id}-verdicts` }, clear.map(verdictItem)),
          rest.length
            ? h('details', { class: 'verdicts-rest' }, h('summary', {}, `${plural(rest.length, 'other comparison')}: no clear change, or too few answers`), h('ul', { class: 'verdicts' }, rest.map(verdictItem)))
            : null,
        ],
    notCompared.length
      ? h(
          'details',
          { class: 'not-compared', id: `${id}-not-compared`, open: notCompared.length <= 6 },
          h('summary', {}, `Not compared (${count(notCompared.length)}): no share in a wave, or shares counted over different answers`),
          h('ul', { class: 'verdicts' }, notCompared.map((n) => h('li', { class: 'verdict v-not-compared' }, h('span', { class: 'words' }, `\u201c${n.code}\u201d, ${n.from} \u2192 ${n.to}: `), h('span', { class: 'numbers' }, n.reason)))),
        )
      : null,
    h('h3', {}, 'Share of answers, wave by wave'),
    h('p', { class: 'hint' }, 'Each dot is the share of the answers a person read; its bar the 95% interval (Wilson). A hollow dot is by rule: over the answers its rules ran on. Bases under 30 are small; an interval wider than 20 points is imprecise.'),
    q.codes.length === 0 ? h('p', { class: 'hint' }, 'No codes given yet.') : h('div', { class: 'small-multiples' }, q.codes.map((c) => shareChart(c, waves))),
    q.segments && q.segments.length ? bySegment(q, waves, id) : null,
    h('h3', {}, 'Codes that come together'),
    heatmap(q),
    h('h3', {}, 'Has coding found every code?'),
    saturation(q.saturation),
  );
}

function verdictItem(c) {
  return h(
    'li',
    { class: `verdict v-${c.verdict.replaceAll(' ', '-')}` },
    h('span', { class: 'words' }, c.by_rule ? `${sentence(c)} (by rule)` : sentence(c)),
    h('span', { class: 'numbers' }, `${points(c.diff)} (95% interval ${signed(c.ci.lower)} to ${signed(c.ci.upper)}; adjusted p ${pValue(c.p_adjusted)})`),
  );
}

// ---- by segment ----

/** Where each code lives: its share in each value of the segment column, with base and coverage. */
function bySegment(q, waves, id) {
  const segs = q.segments;
  const column = segs[0].segment;
  return h(
    'section',
    { class: 'by-segment', id: `${id}-segments`, 'aria-labelledby': `${id}-segments-h` },
    h('h3', { id: `${id}-segments-h` }, `By ${column}`),
    h('p', { class: 'hint' }, `Each value of “${column}” with the answers a person read in it; a share is over those. Bases under 30 are small (dashed, red): too few to say where a theme lives.`),
    h(
      'div',
      { class: 'tablewrap' },
      h(
        'table',
        { class: 'segment-coverage', id: `${id}-segment-coverage` },
        h('thead', {}, h('tr', {}, h('th', { scope: 'col' }, column), waves.map((w) => h('th', { scope: 'col' }, `${w}: answers read`)))),
        h(
          'tbody',
          {},
          segs.map((s) =>
            h(
              'tr',
              {},
              h('th', { scope: 'row' }, h('bdi', {}, s.value)),
              waves.map((w) => {
                const c = s.coverage[w];
                const small = (s.bases[w] || 0) < 30;
                return h('td', { class: small ? 'small-base' : null }, c ? coverage(c) : '—', small ? h('span', { class: 'tag weak' }, 'small base') : null);
              }),
            ),
          ),
        ),
      ),
    ),
    h('div', { class: 'segment-codes' }, q.codes.map((c) => codeBySegment(c, segs, waves))),
  );
}

/** The latest wave in which some value has a share of the code. */
function latestWave(shares, waves) {
  for (let i = waves.length - 1; i >= 0; i--) if (shares.some((x) => x.share && x.share.waves[waves[i]])) return waves[i];
  return null;
}

function codeBySegment(c, segs, waves) {
  const shares = segs.map((s) => ({ value: s.value, share: s.codes.find((x) => x.code_id === c.code_id) }));
  const top = Math.max(0.1, ...shares.flatMap((x) => (x.share ? Object.values(x.share.waves).map((w) => w.ci.upper) : [])));
  const wave = latestWave(shares, waves);
  return h(
    'figure',
    { class: 'segment-code' },
    h('figcaption', {}, c.parent ? `${c.parent} › ` : '', h('strong', {}, c.code), c.by_rule ? ' (by rule)' : '', ' · ', highest(c, shares, wave)),
    h(
      'table',
      {},
      h('thead', {}, h('tr', {}, h('th', { scope: 'col' }, 'Value'), waves.map((w) => h('th', { scope: 'col' }, w)))),
      h(
        'tbody',
        {},
        shares.map((x) =>
          h(
            'tr',
            {},
            h('th', { scope: 'row' }, h('bdi', {}, x.value)),
            waves.map((w) => shareCell(x.share ? x.share.waves[w] : null, x.share && x.share.no_share ? x.share.no_share[w] : null, top)),
          ),
        ),
      ),
    ),
  );
}

/** The value(s) where the code's share is highest, among bases of 30 or more only. */
function highest(c, shares, wave) {
  if (!wave) return 'no share in any value yet';
  const firm = shares.filter((x) => x.share && x.share.waves[wave] && !x.share.waves[wave].small_base);
  if (firm.length === 0) return h('span', { class: 'flags' }, `no value has a base of 30 or more in ${wave}: too few answers read to say where it is highest`);
  const best = Math.max(...firm.map((x) => x.share.waves[wave].share));
  const at = firm.filter((x) => x.share.waves[wave].share === best);
  const s = at[0].share.waves[wave];
  const names = at.map((x) => `“${x.value}”`).join(' and ');
  const others = firm.length > 1 ? '' : ' (the only value with a base of 30 or more)';
  return `highest in ${names} in ${wave}: ${pct(s.share)} (${s.count} of ${s.base})${others}`;
}

function shareCell(s, why, top) {
  if (!s) return h('td', { class: 'hint' }, why || '—');
  const W = 90;
  const H = 14;
  const x = (v) => 2 + (v / top) * (W - 4);
  const weak = s.small_base || s.imprecise;
  const bar = svg(
    'svg',
    { viewBox: `0 0 ${W} ${H}`, width: W, height: H, 'aria-hidden': 'true', class: 'segment-bar' },
    svg('line', { x1: x(0), x2: W - 2, y1: H - 1, y2: H - 1, class: 'axis' }),
    svg('line', { x1: x(s.ci.lower), x2: x(Math.min(top, s.ci.upper)), y1: H / 2, y2: H / 2, class: `interval${weak ? ' weak' : ''}` }),
    svg('circle', { cx: x(s.share), cy: H / 2, r: 3, class: s.by_rule ? 'dot rule' : 'dot' }),
  );
  return h(
    'td',
    { class: `segment-share${s.small_base ? ' small-base' : ''}` },
    bar,
    ' ',
    h('span', { class: 'numbers' }, `${pct(s.share)} (${pct(s.ci.lower)}–${pct(s.ci.upper)}), ${s.count} of ${s.base}`),
    s.small_base ? h('span', { class: 'tag weak' }, 'small base') : s.imprecise ? h('span', { class: 'tag weak' }, 'imprecise') : null,
  );
}
