import { deflateSync } from "node:zlib";
import { describe, expect, it } from "vitest";
import { PNG } from "pngjs";
import { checkPng, maxCheckedPngPixels } from "@/lib/images/complete-png";

/** A real 8 × 4 RGBA PNG, written by pngjs. */
function samplePng(): Buffer {
  const png = new PNG({ width: 8, height: 4 });
  png.data.fill(0x80);
  return PNG.sync.write(png);
}

describe("checkPng", () => {
  it("passes a PNG that decodes whole, with the size its header gives", () => {
    expect(checkPng(samplePng(), 8, 4)).toBe("complete");
  });

  it("fails one cut short anywhere after its header, or whose header disagrees", () => {
    const png = samplePng();
    // Signature (8) and IHDR (25): the header reads, the image data does not.
    for (const length of [33, 40, png.length - 12, png.length - 1]) {
      expect(checkPng(png.subarray(0, length), 8, 4), `cut at ${length}`).toBe("damaged");
    }
    expect(checkPng(png, 8, 5)).toBe("damaged");
  });

  it("fails one whose image data has a broken checksum", () => {
    const png = Buffer.from(samplePng());
    // The IDAT chunk follows the 33 bytes of signature and IHDR: flip a byte of its data.
    png[33 + 8 + 2] = png[33 + 8 + 2]! ^ 0xff;
    expect(checkPng(png, 8, 4)).toBe("damaged");
  });

  it("refuses to decode more pixels than it allows, whatever the file size", () => {
    // A header claiming 6000 × 6000 pixels (36 MP) in a few bytes: not decoded at all.
    const ihdr = Buffer.alloc(13);
    ihdr.writeUInt32BE(6000, 0);
    ihdr.writeUInt32BE(6000, 4);
    ihdr[8] = 8;
    ihdr[9] = 6;
    expect(6000 * 6000).toBeGreaterThan(maxCheckedPngPixels);
    expect(checkPng(Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47]), ihdr, deflateSync(Buffer.alloc(1))]), 6000, 6000)).toBe(
      "too-many-pixels",
    );
  });
});
