import { z } from "zod";

export const maxPageSize = 500;
export const defaultPageSize = 100;

/** A whole number written in decimal digits (a query-string value), within [min, max]. Refusals name the field by their path. */
export function wholeNumberParam(min: number, max: number) {
  return z
    .string()
    .regex(/^\d{1,9}$/, "must be a whole number")
    .transform(Number)
    .pipe(z.number().int().min(min, `must be at least ${min}`).max(max, `must be at most ${max}`));
}

/**
 * `?limit=&offset=` of a list API: limit 1–500 (default 100), offset 0 or more (default 0). Strict:
 * unknown parameters are refused, so a misspelt "limt" is not silently the default page.
 */
export const pageQuerySchema = z.strictObject({
  limit: wholeNumberParam(1, maxPageSize).default(defaultPageSize),
  offset: wholeNumberParam(0, 999_999_999).default(0),
});

export type PageQuery = z.infer<typeof pageQuerySchema>;

/** One page of a list with what the caller needs to fetch the next. */
export interface Page<T> {
  items: T[];
  total: number;
  limit: number;
  offset: number;
  /** The offset of the next page, or null on the last one. */
  nextOffset: number | null;
}

/** The next page's offset after `count` items from `offset`, or null when the list ends. */
export function nextOffsetAfter(offset: number, count: number, total: number): number | null {
  return offset + count < total ? offset + count : null;
}

/** A query string for a route that takes no parameters: any parameter is refused, naming it. */
export const noQuerySchema = z.strictObject({});
