import fontkit from "@pdf-lib/fontkit";
import type { Font, Glyph, GlyphRun, Subset } from "@pdf-lib/fontkit";

/**
 * The parts of @pdf-lib/fontkit 1.1.1's TrueType subset that the padding below relies on. They are not
 * public API, so the package is pinned exactly and tests/unit/pdf-fonts.test.ts would show a change.
 */
interface TrueTypeSubsetInternals {
  _addGlyph(glyphId: number): number;
  glyf: Uint8Array[];
  offset: number;
}

function hasTrueTypeInternals(subset: Subset): subset is Subset & TrueTypeSubsetInternals {
  return typeof (subset as Partial<TrueTypeSubsetInternals>)._addGlyph === "function";
}

/**
 * Why this exists: fontkit copies each glyph's bytes into the subset unpadded, and when the subset's
 * glyph data is under 64 KB (every certificate and register we print) it writes the short `loca` format,
 * which stores each offset halved. The OpenType spec therefore requires even glyph lengths there;
 * about one Inter glyph in six has an odd length, and every glyph after the first such one then starts
 * a byte early and is drawn wrong or not at all. pdftotext still reads the text (the Unicode map is
 * fine), so the loss is silent. Padding each glyph with a zero byte to an even length is what font
 * compilers do; glyph parsers ignore bytes after a glyph's data.
 */
function padGlyphsToEvenLength(subset: Subset): Subset {
  if (!hasTrueTypeInternals(subset)) {
    throw new Error("Not a fontkit 1.1.1 TrueType subset: see lib/pdf/plain-fontkit.ts before changing fonts");
  }
  const addGlyph = subset._addGlyph.bind(subset);
  subset._addGlyph = (glyphId: number): number => {
    const index = addGlyph(glyphId);
    const data = subset.glyf[index];
    if (data === undefined || index !== subset.glyf.length - 1) {
      throw new Error("fontkit's TrueType subset changed: see lib/pdf/plain-fontkit.ts");
    }
    if (data.length % 2 === 1) {
      // The same Buffer class as fontkit's own (it bundles a polyfill, whose streams refuse Node's).
      const bytes = data.constructor as { alloc?: (size: number) => Uint8Array };
      if (typeof bytes.alloc !== "function") {
        throw new Error("fontkit's TrueType subset changed: see lib/pdf/plain-fontkit.ts");
      }
      const padded = bytes.alloc(data.length + 1);
      padded.set(data);
      subset.glyf[index] = padded;
      subset.offset += 1;
    }
    return index;
  };
  return subset;
}

/** fontkit's exceptions to Unicode's default-ignorable code points (as HarfBuzz and Uniscribe). */
const shownFillers = new Set([0x115f, 0x1160, 0x3164, 0xffa0]);
const defaultIgnorable = /^\p{Default_Ignorable_Code_Point}$/u;

/** Whether fontkit's layout draws the code point as an invisible space. */
export function isDefaultIgnorable(codePoint: number): boolean {
  return !shownFillers.has(codePoint) && defaultIgnorable.test(String.fromCodePoint(codePoint));
}

/**
 * A glyph as one call used it: the parsed glyph (shared, through the prototype) with the code points of
 * this character. fontkit keeps one glyph object per glyph id, labelled with the first character that
 * asked for it; pdf-lib builds a document's Unicode map from those labels. Inter draws a few characters
 * with one glyph (ι and ɩ, Δ and ∆): with the font parsed once per process, a label from an earlier
 * document would otherwise make a later one extract the wrong character.
 */
function asUsedFor(glyph: Glyph, codePoint: number | undefined): Glyph {
  if (codePoint === undefined) return glyph;
  return Object.create(glyph, { codePoints: { value: [codePoint], enumerable: true } }) as Glyph;
}

/**
 * The glyphs fontkit's layout gives with every OpenType feature off, without running its layout engine:
 * each code point's glyph from the character map, default-ignorable ones (soft hyphen, zero-width
 * joiner, …) as the space glyph. Setting the engine up on every call and decoding the GSUB and GPOS
 * tables in every document cost 15 to 20 ms a certificate. pdf-lib reads only the glyphs of a layout
 * (not the positions). tests/unit/pdf-fonts.test.ts checks, for every code point Inter maps and every
 * default-ignorable one, that these are the glyphs fontkit's layout gives for the character alone,
 * which is how `embedPlainFont` encodes and measures text.
 */
function plainGlyphs(font: Font, text: string): Glyph[] {
  const space = font.glyphForCodePoint(0x20);
  const characters = [...text];
  const glyphs = font.glyphsForString(text);
  // embedPlainFont asks one character at a time, so each glyph's own character is known; otherwise the
  // glyph's first code point decides, as fontkit does (a glyph fontkit created for a component has none).
  const oneEach = glyphs.length === characters.length;
  return glyphs.map((glyph, index) => {
    const codePoint = oneEach ? characters[index]!.codePointAt(0) : glyph.codePoints[0];
    if (codePoint !== undefined && isDefaultIgnorable(codePoint)) return asUsedFor(space, 0x20);
    return asUsedFor(glyph, codePoint);
  });
}

/** Fonts parsed once per process, by their bytes (lib/pdf/fonts.ts reads each file once). */
const parsedFonts = new WeakMap<Uint8Array, Font>();

/**
 * fontkit for pdf-lib as `embedPlainFont` needs it: plain layout (only for fonts embedded with every
 * feature off), TrueType subsets that keep every glyph (see padGlyphsToEvenLength), and each font parsed
 * once per process: parsing copies the 340 KB face and reads its tables, about 9 ms of a certificate's
 * CPU for its two faces. Sharing is safe because documents only read the font: each makes its own subset,
 * and the glyphs it is given carry its own characters (asUsedFor).
 */
export const plainFontkit: typeof fontkit = {
  create(buffer, postscriptName) {
    const key = postscriptName === undefined && buffer instanceof Uint8Array ? buffer : null;
    const kept = key ? parsedFonts.get(key) : undefined;
    if (kept) return kept;
    const font = fontkit.create(buffer, postscriptName);
    const createSubset = font.createSubset.bind(font);
    font.createSubset = () => padGlyphsToEvenLength(createSubset());
    // pdf-lib reads only `glyphs` from the run, so a run of glyphs alone stands in for fontkit's.
    font.layout = (text: string) => ({ glyphs: plainGlyphs(font, text) }) as GlyphRun;
    if (key) parsedFonts.set(key, font);
    return font;
  },
};
