// Riffle's own API: the only thing this page ever fetches.

/** A failed request, with the server's message and where the problem is. */
export class ApiError extends Error {
  constructor(status, body) {
    super(body && body.error ? body.error : `the server answered ${status}`);
    this.status = status;
    this.where = (body && body.where) || {};
  }
}

/**
 * Calls the API. body: a value sent as JSON, or, with raw: true, bytes or a File sent as they are.
 * Resolves to the parsed JSON answer; rejects with ApiError.
 */
export async function api(path, { method = 'GET', body, raw = false } = {}) {
  const options = { method, headers: { Accept: 'application/json' }, credentials: 'same-origin' };
  if (body !== undefined) {
    options.headers['Content-Type'] = raw ? 'application/octet-stream' : 'application/json';
    options.body = raw ? body : JSON.stringify(body);
  }
  let res;
  try {
    res = await fetch(path, options);
  } catch (e) {
    throw new ApiError(0, { error: 'Riffle is not answering: is `riffle serve` still running?' });
  }
  let data = null;
  try {
    data = await res.json();
  } catch (e) {
    data = { error: `the server answered ${res.status} without a readable message` };
  }
  if (!res.ok) throw new ApiError(res.status, data);
  return data;
}

/** The whole masked text of an answer the server sent only the start of (its `truncated` flag). */
export async function wholeText(answerId) {
  const got = await api(`/api/answers/${answerId}/text`);
  return got.text;
}

/** A query string from an object; arrays repeat their key; empty values are left out. */
export function query(params) {
  const q = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    for (const v of Array.isArray(value) ? value : [value]) {
      if (v !== undefined && v !== null && String(v) !== '') q.append(key, String(v));
    }
  }
  const s = q.toString();
  return s ? `?${s}` : '';
}
