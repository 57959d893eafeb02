import { describe, expect, it } from "vitest";
import { markdownTable, median, notAvailable, percentile, signed } from "@/scripts/bench/stats";
import { staticLessonHtml } from "@/scripts/bench/static-lesson";

describe("bench statistics", () => {
  it("takes the median of odd and even counts", () => {
    expect(median([5, 1, 3])).toBe(3);
    expect(median([4, 1, 3, 2])).toBe(2.5);
    expect(median([])).toBeNaN();
  });

  it("takes nearest-rank percentiles", () => {
    const values = Array.from({ length: 100 }, (_, i) => i + 1);
    expect(percentile(values, 50)).toBe(50);
    expect(percentile(values, 95)).toBe(95);
    expect(percentile(values, 99)).toBe(99);
    expect(percentile([7], 99)).toBe(7);
    expect(() => percentile(values, 101)).toThrow(RangeError);
  });

  it("signs differences with a real minus sign", () => {
    expect(signed(12.34, 1)).toBe("+12.3");
    expect(signed(-3, 0)).toBe("−3");
    expect(signed(-0.01, 1)).toBe("+0.0");
  });

  it("prints a markdown table, escaping pipes", () => {
    const table = markdownTable([notAvailable("Register PDF | 500 rows", "feature not merged yet", "≤ 1 s")]);
    expect(table.split("\n")).toEqual([
      "| figure | value | baseline | ratio | target | result |",
      "| --- | --- | --- | --- | --- | --- |",
      "| Register PDF \\| 500 rows | n/a (feature not merged yet) | — | — | ≤ 1 s | n/a |",
    ]);
  });
});

describe("bench static lesson page", () => {
  it("keeps headings, escapes text and has no script", () => {
    const html = staticLessonHtml("Setting the inboard · Slipway", [
      { tag: "h1", text: "Setting the inboard" },
      { tag: "p", text: "Move the collar <2 clicks> & check" },
    ]);
    expect(html).toContain("<h1>Setting the inboard</h1>");
    expect(html).toContain("<p>Move the collar &lt;2 clicks&gt; &amp; check</p>");
    expect(html).not.toContain("<script");
  });
});
