import fs from "node:fs";
import os from "node:os";
import path from "node:path";

/** Points SLIPWAY_DATA_DIR at a fresh temporary folder; call before the first database use. */
export function createTempDataDir(label: string): string {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), `slipway-${label}-`));
  process.env.SLIPWAY_DATA_DIR = dir;
  return dir;
}
