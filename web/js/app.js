// The page's frame: screens chosen by the address's #fragment, the project's counts in the
// header, and the keys that work everywhere.
import { api } from './api.js';
import { count, fill, plural } from './dom.js';
import * as bring from './bring.js';
import * as find from './find.js';
import * as phrases from './phrases.js';
import * as coding from './coding.js';
import * as codebook from './codebook.js';
import * as findings from './findings.js';
import * as board from './board.js';

const screens = { bring, find, phrases, coding, codebook, findings, board };
const mounted = new Set();
let summary = null;
const listeners = [];

const ctx = {
  /** The project's counts, as last read. */
  summary: () => summary,
  /** Reads the counts again and tells every screen. */
  refresh,
  /** Shows a screen, handing it parameters (find takes {q}). */
  go(screen, params = {}) {
    pending = params;
    if (location.hash === `#${screen}`) show(screen);
    else location.hash = `#${screen}`;
  },
  /** Calls fn(summary) whenever the counts change. */
  onSummary(fn) {
    listeners.push(fn);
    if (summary) fn(summary);
  },
};

let pending = {};

async function refresh() {
  try {
    const project = await api('/api/project');
    summary = project.summary;
    document.getElementById('project-name').textContent = project.name;
    const s = summary;
    fill(
      document.getElementById('project-counts'),
      [
        plural(s.waves.length, 'wave'),
        plural(s.questions.length, 'question'),
        plural(s.answers, 'answer'),
        `${count(s.substantive)} substantive`,
      ].join(' · '),
    );
    banner(null);
    for (const fn of listeners) fn(summary);
  } catch (e) {
    banner(`The project could not be read: ${e.message}`);
  }
}

function banner(message) {
  const b = document.getElementById('banner');
  b.hidden = !message;
  b.textContent = message || '';
}

function current() {
  const name = location.hash.replace(/^#/, '');
  return screens[name] ? name : 'find';
}

function show(name) {
  for (const section of document.querySelectorAll('main > section')) {
    section.hidden = section.dataset.screen !== name;
  }
  for (const link of document.querySelectorAll('nav.screens a')) {
    if (link.dataset.screen === name) link.setAttribute('aria-current', 'page');
    else link.removeAttribute('aria-current');
  }
  const section = document.getElementById(`screen-${name}`);
  if (!mounted.has(name)) {
    screens[name].mount(section, ctx);
    mounted.add(name);
  }
  const params = pending;
  pending = {};
  if (screens[name].shown) screens[name].shown(params);
  document.title = `${section.querySelector('h1')?.textContent || 'Riffle'} · Riffle`;
}

function typing(target) {
  return target.closest('input, textarea, select, [contenteditable]') !== null;
}

document.addEventListener('keydown', (e) => {
  if (e.key === '/' && !e.ctrlKey && !e.metaKey && !e.altKey && !typing(e.target)) {
    e.preventDefault();
    if (screens[current()].slash) screens[current()].slash();
    else if (current() !== 'find') ctx.go('find', { focus: true });
    else find.focus();
  }
});

// Changes made elsewhere (the command line, another page or server on this project): the page asks
// every second whether the project moved; when it did, the counts are read again and the screen
// shown is told, so that it shows them without a reload.
let version = null;

async function watch() {
  if (document.visibilityState === 'visible') {
    try {
      const now = (await api('/api/changes')).version;
      if (version !== null && now !== version) {
        refresh();
        const name = current();
        if (mounted.has(name) && screens[name].changed) screens[name].changed();
      }
      version = now;
    } catch (e) {
      // asked again in a second; a real request shows its own error where it happened
    }
  }
  setTimeout(watch, 1000);
}

window.addEventListener('hashchange', () => show(current()));
show(current());
refresh();
watch();
