import { escapeXml } from '../pictures/escape-xml.js';
import { glossaryEntry, glossaryOf, type GlossaryEntry } from '../text/glossary.js';
import { entryText } from './glossary-text.js';

/**
 * The legend of the review page: every column header the page's tables
 * carry and every abbreviation its text (tables, prose and pictures) uses,
 * each in plain words with its unit, read from the one glossary that
 * --help reads too.
 *
 * @param page the page's HTML so far (its tables, prose and inline SVG)
 * @returns a section with a heading and a definition list
 * @example glossarySection('<table><thead><tr><th>rate</th></tr></thead></table>').includes('<dt>rate</dt>') // true
 */
export function glossarySection(page: string): string {
  const entries = pageEntries(page);
  const items = entries.map((e) => `<dt>${escapeXml(e.term)}</dt><dd>${escapeXml(entryText(e))}</dd>`).join('');
  return `<h2>Words and abbreviations on this page</h2><dl class="glossary">${items}</dl>`;
}

/** The entries a page needs: its headers, then the abbreviations found in its text, each once. */
function pageEntries(page: string): GlossaryEntry[] {
  const headers = [...page.matchAll(/<th>([^<]*)<\/th>/g)].map((m) => unescape(m[1]!));
  const text = unescape(page.replace(/<style>[\s\S]*?<\/style>/g, ' ').replace(/<[^>]+>/g, ' '));
  const found = new Set<GlossaryEntry>();
  for (const header of headers) {
    const entry = glossaryEntry(header, 'report');
    if (entry) found.add(entry);
  }
  const abbreviations = glossaryOf('report').filter((e) => e.kind === 'abbreviation' && (e.matches ?? literal(e.term)).test(text));
  return [...glossaryOf('report').filter((e) => found.has(e)), ...abbreviations];
}

function literal(term: string): RegExp {
  return new RegExp(term.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&'));
}

/** Text back from escapeXml's entities. */
function unescape(text: string): string {
  return text
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&apos;/g, "'")
    .replace(/&amp;/g, '&');
}
