// Findings: per question, what changed between waves in words first (numbers beside them), each
// code's share over the waves with its interval, the codes that come together, and whether coding
// has found (nearly) all the codes there are. Charts are SVG drawn here; no library.
import { api, query } from './api.js';
import { h, fill, count, plural } from './dom.js';
import { segmentPicker } from './segments.js';

const SVG = 'http://www.w3.org/2000/svg';

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
  fill(els.question, h('option', { value: '' }, 'All questions'), summary.questions.map((text, i) => h('option', { value: String(i + 1), props: { selected: q === String(i + 1) } }, `${i + 1}. ${text}`)));
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
    fill(els.out, f.questions.map(questionFindings));
  } catch (e) {
    if (mine !== asked) return;
    els.status.textContent = '';
    fill(els.error, h('strong', {}, 'Cannot show the findings: '), e.message);
    els.error.hidden = false;
  }
}

// ---- words and numbers ----

function pct(x) {
  return `${(x * 100).toFixed(1)}%`;
}

function signed(x) {
  const v = (x * 100).toFixed(1);
  return `${x > 0 ? '+' : x < 0 ? '\u2212' : ''}${v.replace('-', '')}`;
}

function points(x) {
  return `${signed(x)} points`;
}

function pValue(p) {
  return p < 0.001 ? '< 0.001' : p.toFixed(3);
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

/** "about 536 of 5,000 in the wave (300–850)" */
function projection(p) {
  return `about ${count(Math.round(p.count))} of ${count(p.population)} in the wave (${count(p.lower)}–${count(p.upper)})`;
}

function coverageLine(q) {
  const entries = Object.entries(q.coverage || {});
  const apart = entries.reduce((n, [, c]) => n + c.non_answers, 0);
  return [entries.map(([w, c]) => `${w} ${coverage(c)}`).join(' \u00b7 '), apart ? ` (${plural(apart, 'non-answer')} counted nowhere)` : ''].join('');
}

function questionFindings(q, index) {
  const id = `findings-q${index + 1}`;
  const waves = Object.keys(q.bases);
  const notCompared = q.not_compared || [];
  const changes = [...q.changes].sort((a, b) => ORDER[a.verdict] - ORDER[b.verdict] || a.p_adjusted - b.p_adjusted);
  const clear = changes.filter((c) => c.verdict === 'rose' || c.verdict === 'fell');
  const rest = changes.filter((c) => c.verdict !== 'rose' && c.verdict !== 'fell');
  return h(
    'section',
    { class: 'panel findings', 'aria-labelledby': id },
    h('h2', { id }, q.question),
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

// ---- SVG ----

function svg(tag, attrs = {}, ...children) {
  const el = document.createElementNS(SVG, tag);
  for (const [k, v] of Object.entries(attrs)) el.setAttribute(k, String(v));
  for (const c of children) if (c) el.append(typeof c === 'string' ? document.createTextNode(c) : c);
  return el;
}

function shareChart(c, waves) {
  const W = 220;
  const H = 120;
  const pad = { l: 34, r: 24, t: 10, b: 24 };
  const shares = waves.map((w) => c.waves[w]).filter(Boolean);
  const top = Math.max(0.1, ...shares.map((s) => s.ci.upper));
  const x = (i) => pad.l + (waves.length === 1 ? (W - pad.l - pad.r) / 2 : (i * (W - pad.l - pad.r)) / (waves.length - 1));
  const y = (v) => pad.t + (1 - v / top) * (H - pad.t - pad.b);
  const chart = svg('svg', { viewBox: `0 0 ${W} ${H}`, width: W, height: H, role: 'img', 'aria-label': `${c.code}: ${waves.map((w) => (c.waves[w] ? `${w} ${pct(c.waves[w].share)}` : '')).join(', ')}` });
  chart.append(svg('line', { x1: pad.l, x2: W - pad.r, y1: y(0), y2: y(0), class: 'axis' }));
  chart.append(svg('text', { x: pad.l - 4, y: y(top) + 4, class: 'tick', 'text-anchor': 'end' }, `${Math.round(top * 100)}%`));
  chart.append(svg('text', { x: pad.l - 4, y: y(0) + 4, class: 'tick', 'text-anchor': 'end' }, '0'));
  // One trend line per kind of share: read answers, and by rule (never joined to each other).
  const paths = { read: [], rule: [] };
  waves.forEach((w, i) => {
    const s = c.waves[w];
    if (!s) return;
    const path = paths[s.by_rule ? 'rule' : 'read'];
    path.push(`${path.length ? 'L' : 'M'}${x(i).toFixed(1)},${y(s.share).toFixed(1)}`);
    chart.append(svg('line', { x1: x(i), x2: x(i), y1: y(s.ci.lower), y2: y(s.ci.upper), class: `interval${s.small_base || s.imprecise ? ' weak' : ''}` }));
    chart.append(svg('circle', { cx: x(i), cy: y(s.share), r: 3.5, class: s.by_rule ? 'dot rule' : 'dot' }));
    chart.append(svg('text', { x: x(i), y: H - 8, class: 'tick', 'text-anchor': 'middle' }, w.length > 10 ? `${w.slice(0, 9)}\u2026` : w));
  });
  for (const [kind, path] of Object.entries(paths)) {
    if (path.length > 1) chart.insertBefore(svg('path', { d: path.join(' '), class: kind === 'rule' ? 'trend rule' : 'trend' }), chart.firstChild);
  }
  const flags = [];
  const projected = [];
  for (const w of waves) {
    const s = c.waves[w];
    if (!s) {
      if (c.no_share && c.no_share[w]) flags.push(`no share in ${w}: ${c.no_share[w]}`);
      continue;
    }
    if (s.projected) projected.push(`${w}: ${projection(s.projected)}`);
    if (s.small_base) flags.push(`small base in ${w} (${s.base})`);
    else if (s.imprecise) flags.push(`imprecise in ${w}`);
  }
  const last = waves.map((w) => c.waves[w]).filter(Boolean).pop();
  return h(
    'figure',
    { class: 'share-chart' },
    h('figcaption', {}, c.parent ? `${c.parent} \u203a ` : '', h('strong', {}, c.code), c.by_rule ? ' (by rule)' : '', last ? ` \u00b7 ${pct(last.share)} in the latest wave with a share (${last.count} of ${last.base} ${last.by_rule ? 'by rule' : 'read'})` : ''),
    chart,
    flags.length ? h('p', { class: 'flags' }, flags.join('; ')) : null,
    projected.length ? h('p', { class: 'hint projected' }, projected.join('; ')) : null,
  );
}

function heatmap(q) {
  const pooled = q.cooccurrence.filter((c) => c.wave === null || c.wave === undefined);
  const names = q.codes.filter((c) => !c.theme).map((c) => c.code);
  const used = names.filter((n) => pooled.some((c) => c.a === n || c.b === n));
  if (used.length < 2) return h('p', { class: 'hint' }, 'Too few codes given together to draw yet.');
  const cell = 26;
  const label = 150;
  const W = label + used.length * cell + 80;
  const H = label + used.length * cell + 10;
  const find = (a, b) => pooled.find((c) => (c.a === a && c.b === b) || (c.a === b && c.b === a));
  const top = Math.max(0.01, ...pooled.map((c) => c.jaccard));
  const chart = svg('svg', { viewBox: `0 0 ${W} ${H}`, width: W, height: H, role: 'img', 'aria-label': 'How often codes are given to the same answers (Jaccard), darker is more often' });
  used.forEach((n, i) => {
    const short = n.length > 22 ? `${n.slice(0, 21)}\u2026` : n;
    chart.append(svg('text', { x: label - 6, y: label + i * cell + cell / 2 + 4, class: 'tick', 'text-anchor': 'end' }, short));
    chart.append(svg('text', { x: 0, y: 0, class: 'tick', transform: `translate(${label + i * cell + cell / 2 + 4},${label - 6}) rotate(-60)` }, short));
  });
  used.forEach((a, i) => {
    used.forEach((b, j) => {
      if (i === j) return;
      const c = find(a, b);
      const v = c ? c.jaccard / top : 0;
      const rect = svg('rect', { x: label + j * cell, y: label + i * cell, width: cell - 2, height: cell - 2, class: 'heat', 'fill-opacity': (0.06 + 0.94 * v).toFixed(2) });
      rect.append(svg('title', {}, c ? `${a} and ${b}: ${c.count} answers together, Jaccard ${c.jaccard.toFixed(2)}, lift ${c.lift.toFixed(2)}, p ${pValue(c.p)}` : `${a} and ${b}: never together`));
      chart.append(rect);
      if (c && c.count > 0) chart.append(svg('text', { x: label + j * cell + (cell - 2) / 2, y: label + i * cell + cell / 2 + 3, class: `cellnum${v > 0.55 ? ' light' : ''}`, 'text-anchor': 'middle' }, String(c.count)));
    });
  });
  const strongest = [...pooled].filter((c) => c.lift > 1 && c.count > 0).sort((a, b) => b.jaccard - a.jaccard)[0];
  return h(
    'figure',
    { class: 'heatmap' },
    chart,
    h('figcaption', { class: 'hint' }, 'Numbers are answers carrying both codes; darker cells share more of their answers (Jaccard).', strongest ? ` Most often together: \u201c${strongest.a}\u201d and \u201c${strongest.b}\u201d (${strongest.count} answers, ${strongest.lift.toFixed(1)}\u00d7 chance).` : ''),
  );
}

function saturation(s) {
  if (s.coded === 0) return h('p', { class: 'hint', id: 'findings-saturation' }, 'No answer read by a person yet.');
  if (s.observed === 0) return h('p', { class: 'hint', id: 'findings-saturation' }, `${plural(s.coded, 'answer')} read by a person; no code given to them yet.`);
  const W = 460;
  const H = 180;
  const pad = { l: 40, r: 16, t: 12, b: 30 };
  const maxX = Math.max(1, s.coded);
  const maxY = Math.max(1, s.observed, Number.isFinite(s.ci.upper) ? s.ci.upper : s.chao1) * 1.1;
  const x = (v) => pad.l + (v / maxX) * (W - pad.l - pad.r);
  const y = (v) => pad.t + (1 - v / maxY) * (H - pad.t - pad.b);
  const chart = svg('svg', { viewBox: `0 0 ${W} ${H}`, width: W, height: H, role: 'img', 'aria-label': `Distinct codes against answers read; Chao1 estimate ${s.chao1.toFixed(1)}` });
  chart.append(svg('rect', { x: pad.l, width: W - pad.l - pad.r, y: y(Math.min(maxY, s.ci.upper)), height: Math.max(0, y(s.ci.lower) - y(Math.min(maxY, s.ci.upper))), class: 'band' }));
  chart.append(svg('line', { x1: pad.l, x2: W - pad.r, y1: y(s.chao1), y2: y(s.chao1), class: 'estimate' }));
  chart.append(svg('text', { x: W - pad.r, y: y(s.chao1) - 4, class: 'tick', 'text-anchor': 'end' }, `estimated ${s.chao1.toFixed(1)}`));
  const d = s.curve.map((p, i) => `${i ? 'L' : 'M'}${x(p.answers).toFixed(1)},${y(p.codes).toFixed(1)}`).join(' ');
  chart.append(svg('path', { d, class: 'curve' }));
  chart.append(svg('line', { x1: pad.l, x2: W - pad.r, y1: y(0), y2: y(0), class: 'axis' }));
  chart.append(svg('line', { x1: pad.l, x2: pad.l, y1: pad.t, y2: y(0), class: 'axis' }));
  chart.append(svg('text', { x: pad.l, y: H - 8, class: 'tick' }, '0'));
  chart.append(svg('text', { x: W - pad.r, y: H - 8, class: 'tick', 'text-anchor': 'end' }, `${count(s.coded)} answers read`));
  chart.append(svg('text', { x: pad.l - 6, y: y(s.observed) + 4, class: 'tick', 'text-anchor': 'end' }, String(s.observed)));
  const words =
    s.new_in_window === 0 && s.coded >= s.window
      ? `The last ${s.window} answers read brought no new code: coding looks close to complete.`
      : `The last ${Math.min(s.window, s.coded)} answers read brought ${plural(s.new_in_window, 'new code')}.`;
  return h(
    'figure',
    { class: 'saturation', id: 'findings-saturation' },
    h('p', {}, `${plural(s.observed, 'code')} found in ${plural(s.coded, 'answer')} read by a person; Chao1 estimates ${s.chao1.toFixed(1)} in all (95% interval ${s.ci.lower.toFixed(1)} to ${Number.isFinite(s.ci.upper) ? s.ci.upper.toFixed(1) : 'open'}). ${words}`),
    chart,
  );
}
