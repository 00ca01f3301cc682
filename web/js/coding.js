// Coding: one answer at a time with the keyboard. Arrives with the codebook and assignments;
// until then the screen says so.
import { h, fill } from './dom.js';

export function mount(section) {
  fill(
    section,
    h('h1', { id: 'h-coding' }, 'Coding'),
    h(
      'div',
      { class: 'empty' },
      h('p', {}, 'Coding answers by keyboard arrives with the codebook.'),
      h('p', {}, 'Meanwhile, find answers or look at the recurring phrases to plan the codes.'),
    ),
  );
}
