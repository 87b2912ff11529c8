/** Characters XML 1.0 does not allow at all (C0 controls but tab, LF, CR; U+FFFE, U+FFFF; lone surrogates), and DEL and the C1 controls, which it discourages. */
const NOT_XML =
  // eslint-disable-next-line no-control-regex -- finding control characters is the point
  /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g;

/**
 * Escapes text for XML character data and attribute values: &, <, >, " and '
 * become entities; characters XML cannot carry at all become U+FFFD.
 *
 * @param text any string (a label from a scenario file)
 * @returns text safe inside an element or a quoted attribute
 * @example escapeXml('IM3 <2·A−B> & "co"') // 'IM3 &lt;2·A−B&gt; &amp; &quot;co&quot;'
 */
export function escapeXml(text: string): string {
  return text
    .replace(NOT_XML, '\uFFFD')
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/"/g, '&quot;')
    .replace(/'/g, '&apos;');
}
