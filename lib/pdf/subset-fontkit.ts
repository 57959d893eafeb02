import fontkit from "@pdf-lib/fontkit";
import type { Subset } from "@pdf-lib/fontkit";

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
    throw new Error(
      "Not a fontkit 1.1.1 TrueType subset: see lib/pdf/subset-fontkit.ts before changing fonts",
    );
  }
  const addGlyph = subset._addGlyph.bind(subset);
  subset._addGlyph = (glyphId: number): number => {
    const index = addGlyph(glyphId);
    const data = subset.glyf[index];
    if (data === undefined || index !== subset.glyf.length - 1) {
      throw new Error("fontkit's TrueType subset changed: see lib/pdf/subset-fontkit.ts");
    }
    if (data.length % 2 === 1) {
      // The same Buffer class as fontkit's own (it bundles a polyfill, whose streams refuse Node's).
      const bytes = data.constructor as { alloc?: (size: number) => Uint8Array };
      if (typeof bytes.alloc !== "function") {
        throw new Error("fontkit's TrueType subset changed: see lib/pdf/subset-fontkit.ts");
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

/** fontkit for pdf-lib whose TrueType subsets keep every glyph (see padGlyphsToEvenLength). */
export const subsetSafeFontkit: typeof fontkit = {
  create(buffer, postscriptName) {
    const font = fontkit.create(buffer, postscriptName);
    const createSubset = font.createSubset.bind(font);
    font.createSubset = () => padGlyphsToEvenLength(createSubset());
    return font;
  },
};
