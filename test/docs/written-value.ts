/**
 * The results doc examples write after ` // `, read as values: numbers (with
 * − or -, Infinity, exponents) compared to the digits written, strings in
 * single or double quotes, true/false/null/undefined, arrays, and objects
 * whose keys are compared only where written.
 */

/** A written value; numbers carry the tolerance their written digits give. */
export type Written =
  | { readonly kind: 'number'; readonly value: number; readonly tolerance: number }
  | { readonly kind: 'plain'; readonly value: string | boolean | null | undefined }
  /** A string written ending in `...` or `…`: the result starts with the text before it. */
  | { readonly kind: 'prefix'; readonly value: string }
  /** `open`: the array was written ending in `...` or `…`, so it may hold more items. */
  | { readonly kind: 'array'; readonly items: readonly Written[]; readonly open: boolean }
  | { readonly kind: 'object'; readonly entries: ReadonlyArray<readonly [string, Written]> };

/** Base units a result may name after a number (the value is in that unit, never a prefixed one). */
const UNIT = /^(?:Hz|dB|dBFS|dBc|ppm|s|bins?|cycles)?\s*(?:\(.*\))?$/;

/** Splits `code // result` at the first ` // ` outside a string; null when there is none. */
export function splitExample(text: string): { code: string; result: string } | null {
  let quote: string | null = null;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quote) {
      if (c === '\\') i++;
      else if (c === quote) quote = null;
    } else if (c === "'" || c === '"' || c === '`') {
      quote = c;
    } else if (text.startsWith(' // ', i)) {
      return { code: text.slice(0, i).trim(), result: text.slice(i + 4).trim() };
    }
  }
  return null;
}

/**
 * Reads a written result: one value, then optionally a base unit and a note in parentheses.
 *
 * @throws Error when the text is not such a value
 */
export function parseWritten(text: string): Written {
  const reader = { text, at: 0 };
  const value = readValue(reader);
  const rest = text.slice(reader.at).trim();
  if (!UNIT.test(rest)) throw new Error(`after the value, only a base unit or a note in parentheses: ${JSON.stringify(rest)}`);
  return value;
}

interface Reader {
  readonly text: string;
  at: number;
}

function skip(r: Reader): void {
  while (r.at < r.text.length && /\s/.test(r.text[r.at]!)) r.at++;
}

function readValue(r: Reader): Written {
  skip(r);
  const c = r.text[r.at];
  if (c === '[') return readArray(r);
  if (c === '{') return readObject(r);
  if (c === "'" || c === '"') {
    const text = readString(r);
    const open = /(?:\.\.\.|…)$/.exec(text);
    return open ? { kind: 'prefix', value: text.slice(0, open.index) } : { kind: 'plain', value: text };
  }
  for (const [word, value] of [
    ['true', true],
    ['false', false],
    ['null', null],
    ['undefined', undefined],
  ] as const) {
    if (r.text.startsWith(word, r.at) && !/[\w$]/.test(r.text[r.at + word.length] ?? '')) {
      r.at += word.length;
      return { kind: 'plain', value };
    }
  }
  return readNumber(r);
}

function readNumber(r: Reader): Written {
  const match = /^([−-])?(?:(Infinity)|(\d+)(?:\.(\d+))?(?:e([+−-]?\d+))?)/.exec(r.text.slice(r.at));
  if (!match || match[0] === '' || match[0] === '−' || match[0] === '-')
    throw new Error(`a value expected at ${JSON.stringify(r.text.slice(r.at))}`);
  r.at += match[0].length;
  const sign = match[1] ? -1 : 1;
  if (match[2]) return { kind: 'number', value: sign * Infinity, tolerance: 0 };
  const decimals = (match[4] ?? '').length;
  const exponent = Number((match[5] ?? '0').replace('−', '-'));
  const value = sign * Number(`${match[3]}.${match[4] ?? '0'}e${exponent}`);
  return { kind: 'number', value, tolerance: 0.5 * 10 ** (exponent - decimals) };
}

/** Reads `...` or `…` (more items or keys follow, not written). */
function readEllipsis(r: Reader): boolean {
  for (const mark of ['...', '…']) {
    if (r.text.startsWith(mark, r.at)) {
      r.at += mark.length;
      return true;
    }
  }
  return false;
}

function readString(r: Reader): string {
  const quote = r.text[r.at]!;
  let out = '';
  for (r.at++; r.at < r.text.length; r.at++) {
    const c = r.text[r.at]!;
    if (c === '\\') {
      const escaped = r.text[++r.at]!;
      out += escaped === 'n' ? '\n' : escaped === 't' ? '\t' : escaped;
    } else if (c === quote) {
      r.at++;
      return out;
    } else out += c;
  }
  throw new Error(`unterminated string in ${JSON.stringify(r.text)}`);
}

function readArray(r: Reader): Written {
  r.at++;
  const items: Written[] = [];
  let open = false;
  for (;;) {
    skip(r);
    if (r.text[r.at] === ']') {
      r.at++;
      return { kind: 'array', items, open };
    }
    if (readEllipsis(r)) open = true;
    else items.push(readValue(r));
    skip(r);
    if (r.text[r.at] === ',') r.at++;
    else if (r.text[r.at] !== ']') throw new Error(`, or ] expected in ${JSON.stringify(r.text)}`);
  }
}

function readObject(r: Reader): Written {
  r.at++;
  const entries: [string, Written][] = [];
  for (;;) {
    skip(r);
    if (r.text[r.at] === '}') {
      r.at++;
      return { kind: 'object', entries };
    }
    if (readEllipsis(r)) {
      skip(r);
      if (r.text[r.at] === ',') r.at++;
      continue;
    }
    const c = r.text[r.at];
    let key: string;
    if (c === "'" || c === '"') key = readString(r);
    else {
      const match = /^[A-Za-z_$][\w$]*/.exec(r.text.slice(r.at));
      if (!match) throw new Error(`a key expected in ${JSON.stringify(r.text.slice(r.at))}`);
      key = match[0];
      r.at += key.length;
    }
    skip(r);
    if (r.text[r.at] !== ':') throw new Error(`: expected after ${key}`);
    r.at++;
    entries.push([key, readValue(r)]);
    skip(r);
    if (r.text[r.at] === ',') r.at++;
    else if (r.text[r.at] !== '}') throw new Error(`, or } expected in ${JSON.stringify(r.text)}`);
  }
}

/** Whether a value matches what was written: numbers within the written digits, objects on the written keys. */
export function matchesWritten(actual: unknown, written: Written): boolean {
  switch (written.kind) {
    case 'number':
      if (typeof actual !== 'number' || Number.isNaN(actual)) return false;
      if (!Number.isFinite(written.value)) return actual === written.value;
      return Math.abs(actual - written.value) <= Math.max(written.tolerance * (1 + 1e-9), 4 * Number.EPSILON * Math.abs(written.value));
    case 'plain':
      return actual === written.value;
    case 'prefix':
      return typeof actual === 'string' && actual.startsWith(written.value);
    case 'array': {
      if (!(Array.isArray(actual) || ArrayBuffer.isView(actual))) return false;
      const items = [...(actual as ArrayLike<unknown> & Iterable<unknown>)];
      const lengthFits = written.open ? items.length >= written.items.length : items.length === written.items.length;
      return lengthFits && written.items.every((w, i) => matchesWritten(items[i], w));
    }
    case 'object': {
      if (typeof actual !== 'object' || actual === null) return false;
      const record = actual as Record<string, unknown>;
      return written.entries.every(([key, w]) => matchesWritten(record[key], w));
    }
  }
}
