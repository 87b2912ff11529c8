/** Where streamed JSON goes, a piece at a time (a stream's write, or an array's push). */
export type TextSink = (text: string) => void;

// Pieces are gathered up to this many UTF-16 units before each write: few
// writes, and never one string the size of the whole document.
const FLUSH_AT = 1 << 16;

/**
 * Serialises a report for programs: frequencies stay plain numbers in Hz and
 * the unbounded edge (Infinity) becomes null, which JSON can carry. The text
 * is JSON.stringify's with a two-space indent, and a final line break.
 *
 * @param report any JSON-shaped value
 * @returns the JSON text
 * @example toJson({ maxRate: Infinity }) // '{\n  "maxRate": null\n}\n'
 */
export function toJson(report: unknown): string {
  const pieces: string[] = [];
  writeJson(report, (text) => pieces.push(text));
  return pieces.join('');
}

/**
 * Writes the same text as toJson, in pieces of about 64 k characters, so that
 * a report of any size goes out without being held as one string (V8 refuses
 * strings past about 512 MB; memory runs out well before). Containers are
 * walked; a container that holds only plain values is written whole.
 *
 * @param report any JSON-shaped value (no cycles)
 * @param write receives the text in order
 * @example (() => { const out = []; writeJson([1, Infinity], (t) => out.push(t)); return out.join(''); })() // '[\n  1,\n  null\n]\n'
 */
export function writeJson(report: unknown, write: TextSink): void {
  let buffer: string[] = [];
  let buffered = 0;
  const put = (text: string) => {
    buffer.push(text);
    buffered += text.length;
    if (buffered >= FLUSH_AT) {
      write(buffer.join(''));
      buffer = [];
      buffered = 0;
    }
  };
  put(valueText(jsonValue(report, ''), '', put) ?? 'null');
  put('\n');
  if (buffered > 0) write(buffer.join(''));
}

/** The value JSON.stringify would write for holder[key]: toJSON applied, then Infinity made null. */
function jsonValue(value: unknown, key: string): unknown {
  const own =
    value !== null && typeof value === 'object' && typeof (value as { toJSON?: unknown }).toJSON === 'function'
      ? (value as { toJSON: (k: string) => unknown }).toJSON(key)
      : value;
  return noInfinity(key, own);
}

function noInfinity(_key: string, value: unknown): unknown {
  return value === Infinity ? null : value;
}

/**
 * Writes a container through put, piece by piece, and returns '' for it; a
 * plain value (or a container of plain values) comes back as its text, or
 * undefined for what JSON leaves out (undefined, functions, symbols).
 */
function valueText(value: unknown, indent: string, put: (text: string) => void): string | undefined {
  if (value === null || typeof value !== 'object') return JSON.stringify(value);
  const array = Array.isArray(value);
  const entries: Array<[string, unknown]> = array ? Array.from(value, (v, i) => [String(i), v]) : Object.entries(value);
  if (entries.every(([, v]) => v === null || typeof v !== 'object'))
    return JSON.stringify(value, noInfinity, 2)?.replace(/\n/g, `\n${indent}`);
  const inner = `${indent}  `;
  let first = true;
  put(array ? '[' : '{');
  for (const [key, raw] of entries) {
    const value = jsonValue(raw, key);
    const prefix = `${first ? '' : ','}\n${inner}${array ? '' : `${JSON.stringify(key)}: `}`;
    if (value !== null && typeof value === 'object') {
      put(prefix);
      const text = valueText(value, inner, put);
      if (text !== '') put(text!);
    } else {
      const text = JSON.stringify(value);
      if (text === undefined && !array) continue;
      put(prefix + (text ?? 'null'));
    }
    first = false;
  }
  put(first ? (array ? ']' : '}') : `\n${indent}${array ? ']' : '}'}`);
  return '';
}
