// Random order (sample): the coding screen can serve a wave's answers to a question in a seeded
// random order kept by the project (a review queue). Answers read from the start of that order are
// a random sample of the wave, so the findings can project a code's share to every answer; the
// sentence under the progress says whether the reading still is one. coding.js asks this module for
// its pages when the choice is on; everything else of the screen stays as it is.
import { api, query } from './api.js';
import { h, fill } from './dom.js';
import { current as coderName } from './coder.js';

/** A refusal the coding screen shows like the server's own ({message, where}). */
class Refusal extends Error {
  constructor(message) {
    super(message);
    this.where = {};
  }
}

/**
 * The "Order" choice and the sample sentence. onChange() runs when the choice changes.
 * Returns { field, status, on(), page(params, offset, limit), refresh() }.
 */
export function orderChoice(onChange) {
  const select = h(
    'select',
    {
      id: 'coding-order',
      on: {
        change: () => {
          if (!on()) status.hidden = true;
          onChange();
        },
      },
    },
    h('option', { value: '' }, 'As imported'),
    h('option', { value: 'random' }, 'Random order (sample)'),
  );
  const field = h('div', { class: 'field' }, h('label', { for: 'coding-order' }, 'Order'), select);
  const status = h('p', { class: 'hint coding-sample', id: 'coding-sample', 'aria-live': 'polite', hidden: true });
  const started = new Set(); // queues this page has started or found, by key
  let last = null; // the key of the last page served

  function on() {
    return select.value === 'random';
  }

  function keyOf(params) {
    if (!params.wave || !params.question) {
      throw new Refusal('Pick a wave and a question: a random order is drawn for one wave\u2019s answers to one question.');
    }
    return { wave: params.wave, question: params.question, segment: params.segment || undefined };
  }

  function show(s, params) {
    const ignored = [params.coded && 'Show', params.code && 'With code', params.q && 'Search'].filter(Boolean);
    fill(
      status,
      h('strong', {}, s.sample.random ? 'Random sample. ' : s.sample.read === 0 ? 'Random order. ' : 'Not a random sample. '),
      s.summary,
      ` (Seed ${s.queue.seed}, started by ${s.queue.started_by}.)`,
      ignored.length ? ` The random order leaves out the ${ignored.join(', ')} filter${ignored.length > 1 ? 's' : ''}.` : '',
    );
    status.classList.toggle('broken', !s.sample.random && s.sample.read > 0);
    status.hidden = false;
  }

  async function page(params, offset, limit) {
    const key = keyOf(params);
    const id = JSON.stringify(key);
    if (!started.has(id)) {
      const coder = coderName();
      if (!coder) throw new Refusal('Say who is coding first (above): the project records who started a random order.');
      await api('/api/queues', { method: 'POST', body: { coder, ...key } });
      started.add(id);
    }
    const got = await api(`/api/queues/answers${query({ ...key, offset, limit })}`);
    last = { key, params };
    show(got.status, params);
    got.queue = true;
    return got;
  }

  async function refresh() {
    if (!on() || !last) {
      status.hidden = true;
      return;
    }
    try {
      show(await api(`/api/queues/status${query(last.key)}`), last.params);
    } catch (e) {
      fill(status, `The random order\u2019s state could not be read: ${e.message}`);
    }
  }

  return { field, status, on, page, refresh };
}
