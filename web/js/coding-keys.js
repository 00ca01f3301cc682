// Coding: the keyboard. A code's key gives or takes off that code; j/k move, z undoes, Enter takes
// the top suggestion, "." marks an answer read with no code. The Keys panel explains them.
import { h } from './dom.js';
import { state, READ_KEY, currentAnswer } from './coding-state.js';
import { focusWork } from './coding-draw.js';
import { move } from './coding-load.js';
import { toggle, toggleRead, accept, undo, redo } from './coding-changes.js';
import { topSuggestion } from './coding-suggestions.js';

const RESERVED = new Set(['j', 'k', 'z']);

/** The Keys panel: each key with what it does. */
export function keyHelp() {
  return h(
    'details',
    { class: 'keyhelp', id: 'coding-keyhelp', open: true },
    h('summary', {}, 'Keys'),
    h(
      'dl',
      {},
      [
        ['a code\u2019s key', 'give it to the answer, or take it off'],
        ['select words, then the key', 'give the code to those words'],
        ['j  or  \u2193 \u2192', 'next answer'],
        ['k  or  \u2191 \u2190', 'previous answer'],
        ['Enter', 'accept the top suggestion'],
        [READ_KEY, 'read: no (other) code applies; again to take the mark off'],
        ['z  /  Shift+z', 'undo / redo your last change'],
        ['/', 'search these answers'],
        ['Esc', 'leave the search, back to the answer'],
      ].map(([k, what]) => [h('dt', {}, k), h('dd', {}, what)]),
    ),
  );
}

function typing(target) {
  return target.closest('input, textarea, select, [contenteditable]') !== null;
}

/** The screen's key handler (on the document; it does nothing while the screen is hidden). */
export function onKey(e) {
  if (document.getElementById('screen-coding').hidden) return;
  if (e.ctrlKey || e.metaKey || e.altKey) return;
  if (typing(e.target)) {
    if (e.key === 'Escape') {
      e.target.blur();
      focusWork();
    }
    return;
  }
  if (e.target.closest('button, a, summary') && (e.key === 'Enter' || e.key === ' ')) return;
  const key = e.key;
  if (key === 'j' || key === 'ArrowDown' || key === 'ArrowRight') {
    e.preventDefault();
    move(1);
  } else if (key === 'k' || key === 'ArrowUp' || key === 'ArrowLeft') {
    e.preventDefault();
    move(-1);
  } else if (key === 'z' || key === 'Z') {
    e.preventDefault();
    if (e.shiftKey || key === 'Z') redo();
    else undo();
  } else if (key === READ_KEY) {
    e.preventDefault();
    toggleRead(currentAnswer());
  } else if (key === 'Enter') {
    const top = topSuggestion(currentAnswer());
    if (top) {
      e.preventDefault();
      accept(currentAnswer(), top);
    }
  } else if (key.length === 1 && state.byKey.has(key.toLowerCase()) && !RESERVED.has(key.toLowerCase())) {
    e.preventDefault();
    toggle(currentAnswer(), state.byKey.get(key.toLowerCase()));
  }
}
