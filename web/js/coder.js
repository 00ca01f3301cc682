// Who is coding: a name the page asks once, keeps in this browser (localStorage) and sends with
// every change, so that undo and redo take back that person's own changes only.
import { h, fill } from './dom.js';

const KEY = 'riffle.coder';
const listeners = [];

/** The coder's name, or '' when nobody has said yet. */
export function coder() {
  try {
    return localStorage.getItem(KEY) || '';
  } catch (e) {
    return '';
  }
}

/** Remembers the coder's name and tells every screen. */
export function setCoder(name) {
  try {
    localStorage.setItem(KEY, name);
  } catch (e) {
    // private mode: the name lasts as long as the page
  }
  memory = name;
  for (const fn of listeners) fn(name);
}

let memory = '';

/** The name to send: the stored one, or the one given in this page. */
export function current() {
  return coder() || memory;
}

/** Calls fn(name) whenever the coder changes. */
export function onCoder(fn) {
  listeners.push(fn);
}

/**
 * A bar that shows who is coding, or asks once. idPrefix keeps ids unique per screen.
 */
export function coderBar(idPrefix) {
  const bar = h('div', { class: 'coder-bar', id: `${idPrefix}-coder` });
  const render = () => {
    const name = current();
    if (name) {
      fill(
        bar,
        h('span', {}, 'Coding as ', h('strong', { class: 'coder-name' }, name)),
        h('button', { type: 'button', class: 'quiet', on: { click: ask } }, 'Not you?'),
      );
    } else {
      ask();
    }
  };
  function ask() {
    const input = h('input', { type: 'text', id: `${idPrefix}-coder-name`, autocomplete: 'name', maxlength: '60', value: current() });
    const error = h('p', { class: 'error', role: 'alert', hidden: true });
    fill(
      bar,
      h(
        'form',
        {
          class: 'coder-ask',
          on: {
            submit: (e) => {
              e.preventDefault();
              const name = input.value.trim();
              if (!name) {
                error.textContent = 'Give a name: it marks your changes, and undo takes back only yours.';
                error.hidden = false;
                input.setAttribute('aria-invalid', 'true');
                input.focus();
                return;
              }
              setCoder(name);
            },
          },
        },
        h('label', { for: `${idPrefix}-coder-name` }, 'Who is coding?'),
        h('div', { class: 'row' }, input, h('button', { type: 'submit', class: 'primary', id: `${idPrefix}-coder-go` }, 'Start')),
        h('p', { class: 'hint' }, 'Asked once; this browser remembers it. Every change carries your name.'),
        error,
      ),
    );
  }
  onCoder(render);
  render();
  return bar;
}
