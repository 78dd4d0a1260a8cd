/**
 * The little XML that reading and rewriting workbook parts needs: attributes of one tag,
 * entity decoding and encoding. Every function is a single linear scan (no backtracking
 * patterns), so a crafted part costs time in proportion to its size.
 */

/** Attributes of one start tag's text (the part between the name and `>`), in order. */
export function attributes(tag: string): Map<string, string> {
  const out = new Map<string, string>();
  let i = 0;
  const n = tag.length;
  while (i < n) {
    while (i < n && !isNameChar(tag.charCodeAt(i))) i++;
    const nameStart = i;
    while (i < n && isNameChar(tag.charCodeAt(i))) i++;
    const name = tag.slice(nameStart, i);
    while (i < n && isSpace(tag.charCodeAt(i))) i++;
    if (tag[i] !== "=") continue;
    i++;
    while (i < n && isSpace(tag.charCodeAt(i))) i++;
    const quote = tag[i];
    if (quote !== '"' && quote !== "'") continue;
    const end = tag.indexOf(quote, i + 1);
    if (end < 0) break;
    if (name) out.set(name, decodeXml(tag.slice(i + 1, end)));
    i = end + 1;
  }
  return out;
}

function isSpace(code: number): boolean {
  return code === 32 || code === 9 || code === 10 || code === 13;
}

function isNameChar(code: number): boolean {
  return (code >= 48 && code <= 58) || (code >= 65 && code <= 90) || (code >= 97 && code <= 122) || code === 95 || code === 45 || code === 46 || code > 127;
}

const NAMED: Record<string, string> = { lt: "<", gt: ">", amp: "&", quot: '"', apos: "'" };

export function decodeXml(text: string): string {
  if (!text.includes("&")) return text;
  let out = "";
  let last = 0;
  for (let at = text.indexOf("&"); at >= 0; at = text.indexOf("&", last)) {
    const semi = text.indexOf(";", at);
    if (semi < 0 || semi - at > 10) break;
    const entity = text.slice(at + 1, semi);
    let decoded: string | undefined = NAMED[entity];
    if (decoded === undefined && entity.startsWith("#")) {
      const code = entity[1] === "x" || entity[1] === "X" ? parseInt(entity.slice(2), 16) : parseInt(entity.slice(1), 10);
      if (Number.isInteger(code) && code >= 0 && code <= 0x10ffff) decoded = String.fromCodePoint(code);
    }
    out += text.slice(last, at) + (decoded ?? text.slice(at, semi + 1));
    last = semi + 1;
  }
  return out + text.slice(last);
}

/** Text for element content or a double-quoted attribute value. */
export function encodeXml(text: string): string {
  let out = "";
  let last = 0;
  for (let i = 0; i < text.length; i++) {
    const ch = text.charCodeAt(i);
    const replacement = ch === 38 ? "&amp;" : ch === 60 ? "&lt;" : ch === 62 ? "&gt;" : ch === 34 ? "&quot;" : ch < 32 && ch !== 9 && ch !== 10 && ch !== 13 ? "" : undefined;
    if (replacement === undefined) continue;
    out += text.slice(last, i) + replacement;
    last = i + 1;
  }
  return last === 0 ? text : out + text.slice(last);
}

/**
 * The text content of the elements named `local` (any namespace prefix) inside `xml`, joined:
 * for shared strings and inline strings (`<t>` runs, phonetic runs `<rPh>` left out).
 */
export function textRuns(xml: string): string {
  let out = "";
  let i = 0;
  while (i < xml.length) {
    const open = xml.indexOf("<", i);
    if (open < 0) break;
    const close = xml.indexOf(">", open);
    if (close < 0) break;
    const tag = xml.slice(open + 1, close);
    const name = localName(tag);
    if (name === "rPh" && !tag.endsWith("/")) {
      const end = xml.indexOf("</", close);
      const endTag = findEnd(xml, close, tag);
      i = endTag > 0 ? endTag : end > 0 ? end : xml.length;
      continue;
    }
    if (name === "t" && !tag.endsWith("/")) {
      const end = xml.indexOf("<", close + 1);
      if (end < 0) break;
      out += decodeXml(xml.slice(close + 1, end));
      i = end;
      continue;
    }
    i = close + 1;
  }
  return out;
}

function findEnd(xml: string, from: number, tag: string): number {
  const name = tag.split(/[\s/]/, 1)[0];
  const end = xml.indexOf(`</${name}>`, from);
  return end < 0 ? -1 : end + name.length + 3;
}

/** A tag's local name (namespace prefix and end-tag slash dropped): `x:c r="A1"` -> `c`, `/x:row` -> `row`. */
export function localName(tag: string): string {
  if (tag.startsWith("/")) return localName(tag.slice(1));
  let end = 0;
  while (end < tag.length && !isSpace(tag.charCodeAt(end)) && tag[end] !== "/" && tag[end] !== ">") end++;
  const qualified = tag.slice(0, end);
  const colon = qualified.indexOf(":");
  return colon >= 0 ? qualified.slice(colon + 1) : qualified;
}
