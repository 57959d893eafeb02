import "server-only";
import fs from "node:fs/promises";
import path from "node:path";

export interface FontBytes {
  regular: Uint8Array;
  bold: Uint8Array;
}

let cached: Promise<FontBytes> | null = null;

/**
 * Inter as TTF (OFL, fonts/OFL.txt), read once per process. Fixed path segments, so the bundler traces
 * only fonts/ (next.config.ts includes it for /api routes).
 */
export function pdfFonts(): Promise<FontBytes> {
  cached ??= Promise.all([
    fs.readFile(path.join(process.cwd(), "fonts", "Inter-Regular.ttf")),
    fs.readFile(path.join(process.cwd(), "fonts", "Inter-Bold.ttf")),
  ])
    .then(([regular, bold]) => ({ regular: new Uint8Array(regular), bold: new Uint8Array(bold) }))
    .catch((error: unknown) => {
      cached = null;
      throw error;
    });
  return cached;
}
