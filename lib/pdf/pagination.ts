/** One page of a paged table: rows [start, end) of the whole list. */
export interface PageSlice {
  pageNumber: number;
  start: number;
  end: number;
}

/** How many table rows fit between the repeated header and the footer of a page. */
export function rowsPerPage(layout: { pageHeight: number; top: number; bottom: number; headerHeight: number; rowHeight: number }): number {
  const room = layout.pageHeight - layout.top - layout.bottom - layout.headerHeight;
  const rows = Math.floor(room / layout.rowHeight);
  if (rows < 1) throw new RangeError("the page has no room for a single row");
  return rows;
}

/** Cuts `total` rows into pages of `perPage`; an empty table still prints one page (with its header). */
export function paginate(total: number, perPage: number): PageSlice[] {
  if (!(Number.isInteger(total) && total >= 0)) throw new RangeError(`total must be a whole number, got ${total}`);
  if (!(Number.isInteger(perPage) && perPage >= 1)) throw new RangeError(`perPage must be 1 or more, got ${perPage}`);
  const pageCount = Math.max(1, Math.ceil(total / perPage));
  return Array.from({ length: pageCount }, (_, index) => ({
    pageNumber: index + 1,
    start: index * perPage,
    end: Math.min(total, (index + 1) * perPage),
  }));
}

/** The footer of page n of m. */
export function pageLabel(pageNumber: number, pageCount: number): string {
  return `Page ${pageNumber} of ${pageCount}`;
}
