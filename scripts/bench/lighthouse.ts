import fs from "node:fs";
import { median } from "./stats";

/** The Chromium the project uses everywhere (Debian's package), and flags that work as root in a container. */
export const chromePath = "/usr/bin/chromium";
const chromeFlags = ["--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage", "--disable-quic"];

export interface PageFigures {
  lcpMs: number;
  tbtMs: number;
  cls: number;
  /** Transfer size (gzip as served) of every script resource, bytes. */
  scriptBytes: number;
}

interface NetworkRequestItem {
  url?: string;
  resourceType?: string;
  transferSize?: number;
}

export interface LighthouseRun extends PageFigures {
  finalUrl: string;
  /**
   * When the unthrottled load really painted its largest content (the trace, not the simulation). Lantern
   * counts every request that finished before this moment, so a late observed paint (e.g. on a busy
   * machine) pulls scripts and fonts into the simulated LCP: kept in last.json to explain outliers.
   */
  observedLcpMs: number;
}

export interface LighthouseSession {
  /**
   * One Lighthouse mobile run (its default config: emulated phone, simulated slow 4G and 4× CPU slowdown).
   * With `saveReportTo`, the full report (JSON) is written there, for a closer look.
   */
  run(url: string, cookie: string, saveReportTo?: string): Promise<LighthouseRun>;
  close(): Promise<void>;
}

/** The median of each figure over several runs of one page. */
export function medianFigures(runs: readonly PageFigures[]): PageFigures {
  return {
    lcpMs: median(runs.map((r) => r.lcpMs)),
    tbtMs: median(runs.map((r) => r.tbtMs)),
    cls: median(runs.map((r) => r.cls)),
    scriptBytes: median(runs.map((r) => r.scriptBytes)),
  };
}

/** Launches one headless Chromium (chrome-launcher, as Lighthouse ships it) for every Lighthouse run of the bench. */
export async function openLighthouse(): Promise<LighthouseSession> {
  // Both are ESM-only packages: loaded with import() from this CommonJS script.
  const { default: lighthouse } = await import("lighthouse");
  const chromeLauncher = await import("chrome-launcher");
  const chrome = await chromeLauncher.launch({ chromePath, chromeFlags, logLevel: "silent", handleSIGINT: false });

  let closed = false;
  const runOnce = async (url: string, cookie: string, saveReportTo?: string): Promise<LighthouseRun> => {
    const result = await lighthouse(url, {
      port: chrome.port,
      output: "json",
      logLevel: "error",
      onlyCategories: ["performance"],
      extraHeaders: { Cookie: cookie },
    });
    if (!result) throw new Error(`Lighthouse returned nothing for ${url}`);
    const { lhr } = result;
    if (saveReportTo) fs.writeFileSync(saveReportTo, JSON.stringify(lhr));
    if (lhr.runtimeError) throw new Error(`Lighthouse failed on ${url}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
    const audit = (id: string) => {
      const value = lhr.audits[id]?.numericValue;
      if (typeof value !== "number") throw new Error(`Lighthouse gave no ${id} for ${url}`);
      return value;
    };
    const details = lhr.audits["network-requests"]?.details as { items?: NetworkRequestItem[] } | undefined;
    const scriptBytes = (details?.items ?? [])
      .filter((item) => item.resourceType === "Script")
      .reduce((sum, item) => sum + (item.transferSize ?? 0), 0);
    const observed = (lhr.audits.metrics?.details as { items?: { observedLargestContentfulPaint?: number }[] } | undefined)?.items?.[0];
    return {
      lcpMs: audit("largest-contentful-paint"),
      tbtMs: audit("total-blocking-time"),
      cls: audit("cumulative-layout-shift"),
      scriptBytes,
      finalUrl: lhr.finalDisplayedUrl,
      observedLcpMs: observed?.observedLargestContentfulPaint ?? Number.NaN,
    };
  };

  return {
    run: runOnce,
    async close() {
      if (closed) return;
      closed = true;
      await chrome.kill();
    },
  };
}
