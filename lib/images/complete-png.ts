import { PNG } from "pngjs";

/**
 * The most pixels a PNG may have before it is decoded to be checked: 25 megapixels (100 MB of RGBA while
 * the check runs). A few megabytes of PNG can describe far more, so the count comes from the header first.
 */
export const maxCheckedPngPixels = 25_000_000;

export type PngCheck = "complete" | "damaged" | "too-many-pixels";

/**
 * Whether PNG bytes decode whole (pngjs: every chunk present with its checksum, the image data inflating to
 * the size its header gives). The check behind every stored PNG: pdf-lib's PNG reader never returns on a
 * file cut short after its header, and one such club logo would stall every certificate the club prints.
 * `width` and `height` come from the header (image-size), read before any decoding.
 */
export function checkPng(bytes: Uint8Array, width: number, height: number): PngCheck {
  if (width * height > maxCheckedPngPixels) return "too-many-pixels";
  try {
    const decoded = PNG.sync.read(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength));
    return decoded.width === width && decoded.height === height ? "complete" : "damaged";
  } catch {
    return "damaged";
  }
}
