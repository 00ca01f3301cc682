// Codebook: codes, their keys and rules. Arrives with the coding stage; until then the screen
// says so.
import { h, fill } from './dom.js';

export function mount(section) {
  fill(
    section,
    h('h1', { id: 'h-codebook' }, 'Codebook'),
    h(
      'div',
      { class: 'empty' },
      h('p', {}, 'Building a codebook arrives with the coding stage.'),
      h('p', {}, 'Codes given elsewhere come in with an import, from a codes column.'),
    ),
  );
}
