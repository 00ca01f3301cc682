// Findings: the charts, drawn as SVG here (no library): each code's share over the waves, how
// often codes come together, and whether coding has found (nearly) all the codes there are. Pure
// functions of the findings' data; the few number formats they print are shared with findings.js.
import { h, count, plural } from './dom.js';

const SVG = 'http://www.w3.org/2000/svg';

// ---- numbers ----

export function pct(x) {
  return `${(x * 100).toFixed(1)}%`;
}

export function pValue(p) {
  return p < 0.001 ? '< 0.001' : p.toFixed(3);
}

/** "about 536 of 5,000 in the wave (300–850)" */
export function projection(p) {
  return `about ${count(Math.round(p.count))} of ${count(p.population)} in the wave (${count(p.lower)}–${count(p.upper)})`;
}

// ---- SVG ----

export function svg(tag, attrs = {}, ...children) {
  const el = document.createElementNS(SVG, tag);
  for (const [k, v] of Object.entries(attrs)) el.setAttribute(k, String(v));
  for (const c of children) if (c) el.append(typeof c === 'string' ? document.createTextNode(c) : c);
  return el;
}

export function shareChart(c, waves) {
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

export function heatmap(q) {
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

export function saturation(s) {
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
