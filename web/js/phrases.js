// Phrases: what buyers keep saying in their own words, the themes that travel together, and what
// rose or fell between two waves; every phrase leads to its answers.
import { api, query } from './api.js';
import { h, fill, clear, count, plural, position, questionOptions } from './dom.js';
import { current as coderName } from './coder.js';
import { segmentPicker } from './segments.js';

let ctx;
let els;

export function mount(section, context) {
  ctx = context;
  els = {};
  els.question = h('select', { id: 'phrases-question' });
  els.wave = h('select', { id: 'phrases-wave' });
  els.against = h('select', { id: 'phrases-against' });
  els.segment = segmentPicker('phrases', { ctx, wave: els.wave, question: els.question });
  els.error = h('div', { class: 'error', id: 'phrases-error', role: 'alert', hidden: true });
  els.status = h('p', { class: 'status', id: 'phrases-status', 'aria-live': 'polite' });
  els.out = h('div', { id: 'phrases-out' });
  const form = h(
    'form',
    { class: 'filters', on: { submit: (e) => { e.preventDefault(); run(); } } },
    h('div', { class: 'field' }, h('label', { for: 'phrases-question' }, 'Question'), els.question),
    h('div', { class: 'field' }, h('label', { for: 'phrases-wave' }, 'Wave'), els.wave),
    h('div', { class: 'field' }, h('label', { for: 'phrases-against' }, 'Compare with'), els.against),
    els.segment.fields,
    h('div', { class: 'field end' }, h('button', { type: 'submit', class: 'primary', id: 'phrases-go' }, 'Show phrases')),
  );
  fill(
    section,
    h('h1', { id: 'h-phrases' }, 'Phrases'),
    h('p', { class: 'lead' }, 'What buyers keep saying, in their own words, before you read everything. Pick a wave and a wave to compare it with to see what rose or fell.'),
    form,
    els.error,
    els.status,
    els.out,
  );
  ctx.onSummary(fillChoices);
}

let ran = false;

export function shown() {
  if (!ran && ctx.summary() && ctx.summary().answers > 0) run();
}

function fillChoices(summary) {
  const keep = (sel) => sel.value;
  const q = keep(els.question);
  const w = keep(els.wave);
  const a = keep(els.against);
  fill(
    els.question,
    h('option', { value: '' }, 'All questions'),
    questionOptions(summary, q),
  );
  fill(els.wave, h('option', { value: '' }, 'All waves'), summary.waves.map((x) => h('option', { value: x.name, props: { selected: w === x.name } }, x.name)));
  fill(els.against, h('option', { value: '' }, 'No comparison'), summary.waves.map((x) => h('option', { value: x.name, props: { selected: a === x.name } }, x.name)));
  if (!ran && !document.getElementById('screen-phrases').hidden && summary.answers > 0) run();
}

/** The search query for a phrase within the chosen answers. */
function within(q) {
  const parts = [q];
  if (els.wave.value) parts.push(`wave:"${els.wave.value.replaceAll('"', '')}"`);
  if (els.question.value) parts.push(`question:${els.question.value}`);
  const seg = els.segment.value.trim();
  const eq = seg.indexOf('=');
  if (eq > 0) parts.push(`${seg.slice(0, eq).trim()}:"${seg.slice(eq + 1).trim().replaceAll('"', '')}"`);
  return parts.length > 1 ? parts.map((p, i) => (i === 0 && / OR /.test(p) ? `(${p})` : p)).join(' AND ') : q;
}

function phraseQuery(label) {
  return `"${label.replaceAll('"', '')}"`;
}

let asked = 0;

async function run() {
  const mine = ++asked;
  ran = true;
  els.error.hidden = true;
  clear(els.error);
  if (els.against.value && !els.wave.value) {
    fill(els.error, 'Pick the wave to compare first, then the wave to compare it with.');
    els.error.hidden = false;
    els.wave.focus();
    return;
  }
  els.status.textContent = 'Mining the answers…';
  try {
    const seg = els.segment.value.trim();
    const found = await api(
      `/api/phrases${query({ question: els.question.value, wave: els.wave.value, against: els.against.value, segment: seg || undefined, limit: 40 })}`,
    );
    if (mine !== asked) return; // a newer request is on its way
    els.status.textContent = `${plural(found.answers, 'answer')} mined.`;
    show(found);
  } catch (e) {
    if (mine !== asked) return;
    els.status.textContent = '';
    fill(els.error, h('strong', {}, 'Cannot show phrases: '), e.message);
    els.error.hidden = false;
  }
}

function goFind(q) {
  ctx.go('find', { q: within(q) });
}

function show(found) {
  const allWaves = found.phrases.length ? Object.keys(found.phrases[0].waves) : [];
  // One column per wave only when there is more than one to compare.
  const waveNames = allWaves.length > 1 ? allWaves : [];
  const phrases = h(
    'section',
    { class: 'panel', 'aria-labelledby': 'h-phrases-list' },
    h('h2', { id: 'h-phrases-list' }, 'Recurring phrases'),
    found.phrases.length === 0
      ? h('p', { class: 'empty' }, 'No phrase recurs in these answers yet.')
      : h(
          'div',
          { class: 'tablewrap' },
          h(
            'table',
            { class: 'phrases', id: 'phrases-table' },
            h(
              'thead',
              {},
              h('tr', {}, h('th', { scope: 'col' }, 'Phrase'), h('th', { scope: 'col', class: 'num' }, 'Answers'), waveNames.map((w) => h('th', { scope: 'col', class: 'num' }, w)), h('th', { scope: 'col', class: 'num' }, 'Score')),
            ),
            h(
              'tbody',
              {},
              found.phrases.map((p) =>
                h(
                  'tr',
                  {},
                  h(
                    'th',
                    { scope: 'row' },
                    h('button', { type: 'button', class: 'link', title: p.variants.join(' · '), on: { click: () => goFind(phraseQuery(p.phrase)) } }, p.phrase),
                    p.negated ? h('span', { class: 'tag' }, 'negated') : null,
                    h('button', { type: 'button', class: 'quiet small make-code', 'aria-label': `Make a code of \u201c${p.phrase}\u201d`, on: { click: (e) => makeCode(e.target.closest('th'), p.phrase, phraseQuery(p.phrase)) } }, 'Make a code\u2026'),
                  ),
                  h('td', { class: 'num' }, count(p.answers)),
                  waveNames.map((w) => h('td', { class: 'num' }, count(p.waves[w] || 0))),
                  h('td', { class: 'num' }, p.score.toFixed(1)),
                ),
              ),
            ),
          ),
        ),
  );
  const clusters = h(
    'section',
    { class: 'panel', 'aria-labelledby': 'h-phrases-clusters' },
    h('h2', { id: 'h-phrases-clusters' }, 'Candidate themes: phrases that travel together'),
    found.clusters.length === 0
      ? h('p', { class: 'empty' }, 'No phrases are named together more often than chance allows.')
      : h(
          'ul',
          { class: 'clusters' },
          found.clusters.map((c) =>
            h(
              'li',
              {},
              h('p', { class: 'cluster-phrases' }, c.phrases.join(' · ')),
              h('p', { class: 'meta' }, `${plural(c.answers, 'answer')} · cohesion ${c.cohesion.toFixed(2)}`),
              h('div', { class: 'actions' }, h('button', { type: 'button', class: 'quiet', on: { click: () => goFind(c.query) } }, 'Show these answers'), h('button', { type: 'button', class: 'quiet make-code', on: { click: (e) => makeCode(e.target.closest('li'), c.phrases[0], c.query) } }, 'Make a code\u2026')),
            ),
          ),
        ),
  );
  const parts = [phrases, clusters];
  if (found.against) {
    parts.push(
      h(
        'section',
        { class: 'panel', 'aria-labelledby': 'h-phrases-keyness' },
        h('h2', { id: 'h-phrases-keyness' }, `What rose or fell: ${found.wave} against ${found.against}`),
        h('p', { class: 'hint' }, 'A phrase rose or fell only where its p, adjusted for the many phrases compared (Benjamini\u2013Hochberg), is under 0.05, as in the findings; the rest show no clear change. Judge themes on the findings screen, wording here.'),
        found.keyness.length === 0
          ? h('p', { class: 'empty' }, 'No phrase differs clearly between these waves.')
          : h(
              'div',
              { class: 'tablewrap' },
              h(
                'table',
                { class: 'keyness', id: 'phrases-keyness' },
                h('thead', {}, h('tr', {}, h('th', { scope: 'col' }, 'Phrase'), h('th', { scope: 'col' }, 'Direction'), h('th', { scope: 'col', class: 'num' }, found.wave), h('th', { scope: 'col', class: 'num' }, found.against), h('th', { scope: 'col', class: 'num' }, 'Log ratio'), h('th', { scope: 'col', class: 'num' }, 'p'), h('th', { scope: 'col', class: 'num' }, 'Adjusted p'))),
                h(
                  'tbody',
                  {},
                  found.keyness.map((k) =>
                    h(
                      'tr',
                      {},
                      h('th', { scope: 'row' }, h('button', { type: 'button', class: 'link', on: { click: () => goFind(phraseQuery(k.phrase)) } }, k.phrase)),
                      k.verdict === 'rose' || k.verdict === 'fell'
                        ? h('td', { class: `dir dir-${k.direction}` }, k.verdict === 'rose' ? '\u25b2 rose' : '\u25bc fell')
                        : h('td', { class: 'dir dir-none' }, 'no clear change'),
                      h('td', { class: 'num' }, count(k.focus)),
                      h('td', { class: 'num' }, count(k.reference)),
                      h('td', { class: 'num' }, k.log_ratio.toFixed(2)),
                      h('td', { class: 'num' }, k.p < 0.001 ? '< 0.001' : k.p.toFixed(3)),
                      h('td', { class: 'num' }, k.p_adjusted < 0.001 ? '< 0.001' : k.p_adjusted.toFixed(3)),
                    ),
                  ),
                ),
              ),
            ),
      ),
    );
  }
  fill(els.out, parts);
}

/**
 * Turns a phrase or a candidate theme into a code with its rule: first shows how many answers the
 * rule would find (and a few of them), then creates the code, saves the rule and applies it.
 */
function makeCode(where, label, q) {
  where.querySelector('.make-code-form')?.remove();
  const name = h('input', { type: 'text', class: 'make-code-name', 'aria-label': 'Name of the new code', value: label.charAt(0).toUpperCase() + label.slice(1) });
  const rule = h('input', { type: 'text', class: 'make-code-query', 'aria-label': 'Its rule (a search)', value: q, spellcheck: 'false' });
  const out = h('div', { 'aria-live': 'polite' });
  const go = h('button', { type: 'button', class: 'primary make-code-go', hidden: true }, 'Create code and apply rule');
  const preview = async () => {
    go.hidden = true;
    try {
      const found = await api(`/api/search${query({ q: rule.value.trim(), limit: 3 })}`);
      fill(out, h('p', {}, `The rule finds ${plural(found.total, 'answer')}, for example:`), h('ul', { class: 'sample' }, found.hits.map((x) => h('li', {}, x.text))));
      go.hidden = found.total === 0;
    } catch (e) {
      fill(out, h('p', { class: 'error', role: 'alert' }, `${e.message}${e.where && e.where.column ? ` (${position(e.where)})` : ''}`));
    }
  };
  go.addEventListener('click', async () => {
    const coder = coderName();
    if (!coder) {
      fill(out, h('p', { class: 'error', role: 'alert' }, 'Say who is coding first, on the Coding or Codebook screen.'));
      return;
    }
    go.disabled = true;
    try {
      const made = await api('/api/codes', { method: 'POST', body: { coder, name: name.value.trim() } });
      await api('/api/rules', { method: 'POST', body: { coder, code: made.code.id, query: rule.value.trim() } });
      const applied = await api('/api/rules/apply', { method: 'POST', body: { coder, code: made.code.id } });
      fill(out, h('p', { class: 'done' }, `${made.message} ${applied.message}`));
      go.hidden = true;
      ctx.refresh();
    } catch (e) {
      fill(out, h('p', { class: 'error', role: 'alert' }, `Not created: ${e.message}`));
    } finally {
      go.disabled = false;
    }
  });
  const form = h(
    'form',
    { class: 'make-code-form', on: { submit: (e) => { e.preventDefault(); preview(); } } },
    h('label', {}, 'New code', name),
    h('label', {}, 'Rule', rule),
    h('div', { class: 'actions' }, h('button', { type: 'submit', class: 'quiet make-code-preview' }, 'Preview'), go, h('button', { type: 'button', class: 'quiet', on: { click: () => form.remove() } }, 'Cancel')),
    out,
  );
  where.append(form);
  preview();
  name.focus();
}
