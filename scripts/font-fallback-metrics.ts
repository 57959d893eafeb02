/**
 * Prints the "Slipway Fallback" @font-face rules of app/globals.css: Arial (or its metric twin Liberation
 * Sans) scaled so that lesson text set in it takes the same width and line box as in Inter, one face per
 * weight we use (400, 600, 700). Text paints in the fallback first and swaps to Inter when the font
 * arrives (fonts are not preloaded), so the closer the match, the smaller the layout shift.
 * Usage: `npx tsx scripts/font-fallback-metrics.ts` (needs Liberation Sans, Debian's fonts-liberation).
 */
import fs from "node:fs";
import path from "node:path";
import fontkit from "@pdf-lib/fontkit";

const liberation = "/usr/share/fonts/truetype/liberation";
const faces = [
  {
    weight: "100 500",
    inter: "inter-latin-400-normal.woff2",
    local: ["Arial", "ArialMT", "Liberation Sans", "LiberationSans"],
    file: "LiberationSans-Regular.ttf",
  },
  {
    weight: "600",
    inter: "inter-latin-600-normal.woff2",
    local: ["Arial Bold", "Arial-BoldMT", "Liberation Sans Bold", "LiberationSans-Bold"],
    file: "LiberationSans-Bold.ttf",
  },
  {
    weight: "700 900",
    inter: "inter-latin-700-normal.woff2",
    local: ["Arial Bold", "Arial-BoldMT", "Liberation Sans Bold", "LiberationSans-Bold"],
    file: "LiberationSans-Bold.ttf",
  },
];

// The lessons' own text is the sample: its letter frequencies are what the reader sees.
const modulesDir = path.join(process.cwd(), "content", "modules");
const sample = fs
  .readdirSync(modulesDir)
  .filter((name) => name.endsWith(".mdx"))
  .map((name) => fs.readFileSync(path.join(modulesDir, name), "utf8"))
  .join(" ")
  .replace(/^---[\s\S]*?---/gm, " ")
  .replace(/<[^>]*>|[{}#*_`>|[\]()=-]/g, " ")
  .replace(/\s+/g, " ");

function load(file: string) {
  return fontkit.create(fs.readFileSync(file));
}

/** Width of the sample in ems. */
function sampleWidthEm(font: ReturnType<typeof load>): number {
  return font.layout(sample).glyphs.reduce((sum, glyph) => sum + glyph.advanceWidth, 0) / font.unitsPerEm;
}

const percent = (value: number) => `${(value * 100).toFixed(2)}%`;

for (const face of faces) {
  const inter = load(path.join(process.cwd(), "fonts", face.inter));
  const fallback = load(path.join(liberation, face.file));
  const sizeAdjust = sampleWidthEm(inter) / sampleWidthEm(fallback);
  console.log(`@font-face {
  font-family: "Slipway Fallback";
  src: ${face.local.map((name) => `local("${name}")`).join(", ")};
  font-weight: ${face.weight};
  font-display: swap;
  size-adjust: ${percent(sizeAdjust)};
  ascent-override: ${percent(inter.ascent / inter.unitsPerEm / sizeAdjust)};
  descent-override: ${percent(-inter.descent / inter.unitsPerEm / sizeAdjust)};
  line-gap-override: ${percent(inter.lineGap / inter.unitsPerEm / sizeAdjust)};
}`);
}
