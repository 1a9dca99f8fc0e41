/**
 * Escapes text for use inside an XML element or a double-quoted attribute: `&`, `<`, `>`, `"` and
 * `'` become entities, and characters that XML 1.0 forbids (C0 controls other than tab, line feed
 * and carriage return; lone surrogates; U+FFFE and U+FFFF) are dropped, so that any string a user
 * puts in a model (a member name, a load case) gives a well-formed SVG.
 *
 * @param text - Any string.
 * @returns The string, safe to place between tags or inside `"..."`.
 * @example
 * ```ts
 * escapeXml('Beam "B1" <mezzanine> & stair'); // 'Beam &quot;B1&quot; &lt;mezzanine&gt; &amp; stair'
 * ```
 */
export function escapeXml(text: string): string {
  // Most text (every coordinate list, most labels) needs nothing: return it as it is.
  if (!NEEDS_WORK.test(text)) return text;
  let out = "";
  for (const ch of text) {
    switch (ch) {
      case "&":
        out += "&amp;";
        break;
      case "<":
        out += "&lt;";
        break;
      case ">":
        out += "&gt;";
        break;
      case '"':
        out += "&quot;";
        break;
      case "'":
        out += "&apos;";
        break;
      default:
        if (isXmlChar(ch.codePointAt(0) ?? 0)) out += ch;
    }
  }
  return out;
}

/** Any character that escapeXml changes or drops (markup, C0 controls bar tab/LF/CR, surrogates, U+FFFE/U+FFFF). */
// eslint-disable-next-line no-control-regex
const NEEDS_WORK = /[&<>"'\u0000-\u0008\u000b\u000c\u000e-\u001f\ud800-\udfff\ufffe\uffff]/;

/** True for code points XML 1.0 allows in character data (XML 1.0, 5th ed., production [2] Char). */
function isXmlChar(cp: number): boolean {
  if (cp === 0x9 || cp === 0xa || cp === 0xd) return true;
  if (cp < 0x20) return false;
  if (cp >= 0xd800 && cp <= 0xdfff) return false;
  return cp !== 0xfffe && cp !== 0xffff;
}
