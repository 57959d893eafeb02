import { describe, expect, it } from "vitest";
import { pageLabel, paginate, rowsPerPage } from "@/lib/pdf/pagination";

describe("register pagination", () => {
  it("fits whole rows between header and footer", () => {
    expect(rowsPerPage({ pageHeight: 595, top: 40, bottom: 40, headerHeight: 75, rowHeight: 22 })).toBe(20);
    expect(() => rowsPerPage({ pageHeight: 100, top: 40, bottom: 40, headerHeight: 20, rowHeight: 22 })).toThrow(RangeError);
  });

  it("cuts rows into pages, the last one partial, and prints one page for an empty register", () => {
    expect(paginate(0, 20)).toEqual([{ pageNumber: 1, start: 0, end: 0 }]);
    expect(paginate(20, 20)).toHaveLength(1);
    const pages = paginate(500, 22);
    expect(pages).toHaveLength(23);
    expect(pages[22]).toEqual({ pageNumber: 23, start: 484, end: 500 });
    expect(pages.reduce((sum, page) => sum + page.end - page.start, 0)).toBe(500);
    expect(() => paginate(5, 0)).toThrow(RangeError);
  });

  it("labels pages n of m", () => {
    expect(pageLabel(3, 23)).toBe("Page 3 of 23");
  });
});
