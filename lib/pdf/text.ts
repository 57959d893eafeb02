import { PDFHexString, type PDFDocument, type PDFFont } from "pdf-lib";
import { isDefaultIgnorable, plainFontkit } from "@/lib/pdf/plain-fontkit";

/**
 * OpenType features off: fontkit's full shaping of Inter (contextual alternates, ligatures, kerning)
 * costs about 1 ms a string, which made a 500-row register take 15 s. Plain glyphs cost a tenth of that,
 * and widths then add up exactly, so measuring can use a per-character cache.
 */
export const plainFeatures = {
  liga: false,
  clig: false,
  calt: false,
  rlig: false,
  rclt: false,
  kern: false,
  ccmp: false,
  locl: false,
  mark: false,
  mkmk: false,
  curs: false,
};

/**
 * Embeds only the glyphs the document uses (subset: true) and encodes text a character at a time from a
 * cache. The whole Inter face is ~340 KB, which pdf-lib deflated again on every save and whose width
 * table and Unicode map covered all ~2,900 glyphs: about 95 of a certificate's 160 ms, and 348 of its
 * 366 KB. Plain fontkit subsets do lose letters (an odd-length glyph breaks every glyph after it), so
 * the document gets `plainFontkit` (lib/pdf/plain-fontkit.ts), which fixes that and also skips
 * fontkit's layout engine, since with every feature off each character's glyph is its character-map
 * glyph. tests/unit/pdf-fonts.test.ts draws every character Inter maps from small subsets and compares
 * the pixels with the whole font. pdf-lib would lay out every string afresh; with the cache each
 * distinct character is laid out (and added to the subset) once, which makes a 500-row register several
 * times faster. Without features the glyphs are the same as a whole-string layout.
 */
export async function embedPlainFont(document: PDFDocument, bytes: Uint8Array): Promise<PDFFont> {
  document.registerFontkit(plainFontkit);
  const font = await document.embedFont(bytes, { subset: true, features: plainFeatures });
  const encodeOne = font.encodeText.bind(font);
  const hexByCharacter = new Map<string, string>();
  font.encodeText = (text: string) => {
    let hex = "";
    for (const character of text) {
      let code = hexByCharacter.get(character);
      if (code === undefined) {
        // A zero-width space, joiner or soft hyphen (pasted names carry them) is not drawn: fontkit's
        // glyph for it is the space, which pdf-lib would draw at a space's full width.
        code = isDefaultIgnorable(character.codePointAt(0)!) ? "" : encodeOne(character).asString();
        hexByCharacter.set(character, code);
      }
      hex += code;
    }
    return PDFHexString.of(hex);
  };
  return font;
}

const widthCaches = new WeakMap<PDFFont, Map<string, number>>();

/** Width of text at `size`, from cached widths of each character at size 1. */
export function textWidth(font: PDFFont, text: string, size: number): number {
  let cache = widthCaches.get(font);
  if (!cache) {
    cache = new Map();
    widthCaches.set(font, cache);
  }
  let width = 0;
  for (const character of text) {
    let characterWidth = cache.get(character);
    if (characterWidth === undefined) {
      characterWidth = isDefaultIgnorable(character.codePointAt(0)!) ? 0 : font.widthOfTextAtSize(character, 1);
      cache.set(character, characterWidth);
    }
    width += characterWidth;
  }
  return width * size;
}

/** The text cut with an ellipsis so it fits `maxWidth` at `size`. */
export function fitText(font: PDFFont, text: string, size: number, maxWidth: number): string {
  if (textWidth(font, text, size) <= maxWidth) return text;
  const ellipsis = "…";
  const characters = [...text];
  let low = 0;
  let high = characters.length;
  while (low < high) {
    const middle = Math.ceil((low + high) / 2);
    if (textWidth(font, characters.slice(0, middle).join("").trimEnd() + ellipsis, size) <= maxWidth) low = middle;
    else high = middle - 1;
  }
  return low === 0 ? ellipsis : characters.slice(0, low).join("").trimEnd() + ellipsis;
}

/**
 * The largest size from `size` down to `minSize` (in half points) at which the text fits `maxWidth` on
 * one line; only a text too wide even at `minSize` is cut with an ellipsis. For names, which must not be cut.
 */
export function fitTextShrinking(
  font: PDFFont,
  text: string,
  size: number,
  minSize: number,
  maxWidth: number,
): { text: string; size: number } {
  for (let candidate = size; candidate >= minSize; candidate -= 0.5) {
    if (textWidth(font, text, candidate) <= maxWidth) return { text, size: candidate };
  }
  return { text: fitText(font, text, minSize, maxWidth), size: minSize };
}

/** At most `maxLines` wrapped lines; what does not fit goes onto the last one, cut with an ellipsis. */
export function wrapTextLines(font: PDFFont, text: string, size: number, maxWidth: number, maxLines: number): string[] {
  const lines = wrapText(font, text, size, maxWidth);
  if (lines.length <= maxLines) return lines;
  const kept = lines.slice(0, maxLines - 1);
  const rest = text.split(/\s+/).filter(Boolean).slice(kept.join(" ").split(/\s+/).filter(Boolean).length).join(" ");
  return [...kept, fitText(font, rest, size, maxWidth)];
}

/** Words wrapped into lines no wider than `maxWidth`; a single over-long word is cut to fit. */
export function wrapText(font: PDFFont, text: string, size: number, maxWidth: number): string[] {
  const lines: string[] = [];
  let line = "";
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const candidate = line ? `${line} ${word}` : word;
    if (textWidth(font, candidate, size) <= maxWidth) {
      line = candidate;
      continue;
    }
    if (line) lines.push(line);
    line = textWidth(font, word, size) <= maxWidth ? word : fitText(font, word, size, maxWidth);
  }
  if (line) lines.push(line);
  return lines;
}

/** A string with no spaces (a URL) cut into pieces that fit the line. */
export function wrapCharacters(font: PDFFont, text: string, size: number, maxWidth: number): string[] {
  const lines: string[] = [];
  let line = "";
  for (const character of text) {
    if (line && textWidth(font, line + character, size) > maxWidth) {
      lines.push(line);
      line = "";
    }
    line += character;
  }
  if (line) lines.push(line);
  return lines;
}
