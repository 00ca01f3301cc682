// Building the page from data. Every piece of text goes in as a text node: answer text is
// untrusted, so nothing here ever parses a string as HTML.

/**
 * Creates an element. attrs: plain attributes (set with setAttribute), plus `on` (event
 * handlers) and `props` (DOM properties such as value or checked). Children are nodes or strings;
 * strings become text nodes; null and false are skipped.
 */
export function h(tag, attrs = {}, ...children) {
  const el = document.createElement(tag);
  for (const [key, value] of Object.entries(attrs)) {
    if (value === null || value === undefined || value === false) continue;
    if (key === 'on') {
      for (const [event, fn] of Object.entries(value)) el.addEventListener(event, fn);
    } else if (key === 'props') {
      Object.assign(el, value);
    } else {
      el.setAttribute(key, value === true ? '' : String(value));
    }
  }
  append(el, children);
  return el;
}

function append(el, children) {
  for (const child of children.flat(Infinity)) {
    if (child === null || child === undefined || child === false) continue;
    el.append(child instanceof Node ? child : document.createTextNode(String(child)));
  }
}

/** Removes every child of a node. */
export function clear(node) {
  while (node.firstChild) node.removeChild(node.firstChild);
  return node;
}

/** Replaces a node's children. */
export function fill(node, ...children) {
  clear(node);
  append(node, children);
  return node;
}

/**
 * The text with its matched stretches wrapped in <mark>, split into text nodes.
 * stretches: [{start, end}], character offsets into text, in order.
 */
export function highlighted(text, stretches) {
  const out = document.createDocumentFragment();
  let at = 0;
  for (const s of stretches || []) {
    const start = Math.max(at, Math.min(s.start, text.length));
    const end = Math.max(start, Math.min(s.end, text.length));
    if (start > at) out.append(document.createTextNode(text.slice(at, start)));
    if (end > start) out.append(h('mark', {}, text.slice(start, end)));
    at = end;
  }
  if (at < text.length) out.append(document.createTextNode(text.slice(at)));
  return out;
}

const numbers = new Intl.NumberFormat('en-GB');

/** A count with thousands separators. */
export function count(n) {
  return numbers.format(n);
}

/** "1 answer", "2 answers". */
export function plural(n, one, many = one + 's') {
  return `${count(n)} ${n === 1 ? one : many}`;
}

/** Where a problem happened, in words: "line 3, column 2". */
export function position(where) {
  if (!where) return '';
  const parts = [];
  if (where.line > 0) parts.push(`line ${where.line}`);
  if (where.column > 0) parts.push(`column ${where.column}`);
  return parts.join(', ');
}

/** One option per question of the project summary, numbered, with its short name when it has one. */
export function questionOptions(summary, selected) {
  const names = summary.question_names || {};
  return summary.questions.map((text, i) =>
    h(
      'option',
      { value: String(i + 1), props: { selected: selected === String(i + 1) } },
      `${i + 1}. ${names[text] ? names[text] + ': ' : ''}${text}`,
    ),
  );
}
