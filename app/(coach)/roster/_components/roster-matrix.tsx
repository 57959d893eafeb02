"use client";

import { useEffect, useId, useMemo, useState } from "react";
import Link from "next/link";
import { PendingMark } from "@/components/ui/pending-mark";
import { useSearchParams } from "next/navigation";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
} from "@tanstack/react-table";
import { LoadingState } from "@/components/ui/loading-state";
import { LiveStatus, Notice } from "@/components/ui/notice";
import { ClearanceBadge, StatusBadge, moduleStatusTones } from "@/components/certify/status-badge";
import { moduleStatusLabels, type ClearanceState, type ModuleStatus } from "@/lib/clearance/rules";
import { expiryVerb } from "@/lib/clearance/dates";
import {
  rosterCellLabels,
  rosterFilterLabels,
  rosterRowMatches,
  rosterViewQuery,
  type RosterMatrix,
  type RosterRow,
} from "@/lib/clearance/roster";
import { queryObject, rosterFilters, rosterQuerySchema, type RosterFilter } from "@/lib/validations/certification";

const clearanceRank: Record<ClearanceState, number> = {
  cleared: 0,
  expired: 1,
  suspended: 2,
  "not-cleared": 3,
};
const moduleRank: Record<ModuleStatus, number> = {
  passed: 0,
  "waiting-for-sign-off": 1,
  "ready-for-sign-off": 2,
  "not-yet": 3,
  expired: 4,
  "quiz-failed": 5,
  "lesson-read": 6,
  "not-started": 7,
};

const column = createColumnHelper<RosterRow>();

function shortDate(isoDate: string): string {
  return new Date(`${isoDate}T00:00:00Z`).toLocaleDateString("en-GB", {
    day: "numeric",
    month: "short",
    year: "numeric",
    timeZone: "UTC",
  });
}

function SortMark({ direction }: { direction: false | "asc" | "desc" }) {
  if (!direction)
    return (
      <span aria-hidden="true" className="text-slate-400">
        ↕
      </span>
    );
  return <span aria-hidden="true">{direction === "asc" ? "↑" : "↓"}</span>;
}

type Load = { state: "loading" } | { state: "failed"; message: string } | { state: "ready"; matrix: RosterMatrix };

/**
 * The coach's roster: athletes × modules from GET /api/roster/matrix, sortable by any column, filtered
 * by clearance or waiting sign-offs, searchable by name. On a phone the table scrolls sideways with the
 * names kept in view; every status is words and an icon. The filter and search are kept in the address
 * (`?filter=&q=`, replaced rather than pushed), so a coach who opens an athlete and comes back, or
 * reloads, finds the roster as they left it.
 */
export function RosterMatrixView() {
  const searchId = useId();
  const filterId = useId();
  // Read once, as the roster opens (also when the back button returns to it); a bad value falls back.
  const searchParams = useSearchParams();
  const [initial] = useState(() => rosterQuerySchema.parse(queryObject(searchParams)));
  const [load, setLoad] = useState<Load>({ state: "loading" });
  const [filter, setFilter] = useState<RosterFilter>(initial.filter);
  const [search, setSearch] = useState(initial.q);

  useEffect(() => {
    const query = rosterViewQuery(filter, search);
    const wanted = `${window.location.pathname}${query ? `?${query}` : ""}`;
    if (`${window.location.pathname}${window.location.search}` !== wanted) window.history.replaceState(window.history.state, "", wanted);
  }, [filter, search]);
  const [sorting, setSorting] = useState<SortingState>([{ id: "name", desc: false }]);

  useEffect(() => {
    const controller = new AbortController();
    fetch("/api/roster/matrix", { signal: controller.signal, headers: { Accept: "application/json" } })
      .then(async (response) => {
        if (!response.ok)
          throw new Error(((await response.json().catch(() => ({}))) as { message?: string }).message ?? "The roster could not be loaded.");
        setLoad({ state: "ready", matrix: (await response.json()) as RosterMatrix });
      })
      .catch((error: unknown) => {
        if (controller.signal.aborted) return;
        setLoad({
          state: "failed",
          // A fetch that got no answer rejects with the browser's own words ("Failed to fetch").
          message:
            error instanceof TypeError
              ? "No answer from Slipway: the roster could not be loaded. Reload the page once you have a connection."
              : error instanceof Error
                ? error.message
                : "The roster could not be loaded.",
        });
      });
    return () => controller.abort();
  }, []);

  const matrix = load.state === "ready" ? load.matrix : null;
  const rows = useMemo(
    () => (matrix ? matrix.athletes.filter((row) => rosterRowMatches(row, filter, search, matrix.today)) : []),
    [matrix, filter, search],
  );

  const columns = useMemo(() => {
    if (!matrix) return [];
    return [
      column.accessor("name", {
        id: "name",
        header: "Athlete",
        cell: (info) => (
          <Link href={`/roster/athletes/${info.row.original.id}`} className="font-semibold text-river-700 underline">
            {info.getValue()}
            <PendingMark />
          </Link>
        ),
      }),
      column.accessor((row) => clearanceRank[row.clearance.state], {
        id: "clearance",
        header: "Clearance",
        cell: (info) => {
          const { clearance } = info.row.original;
          return (
            <span className="flex flex-col items-start gap-1">
              <ClearanceBadge state={clearance.state} />
              {clearance.state === "cleared" && clearance.expiresOn && (
                <span className="text-xs text-slate-700">expires {shortDate(clearance.expiresOn)}</span>
              )}
              {clearance.suspendedReason && <span className="max-w-48 text-xs text-slate-700">{clearance.suspendedReason}</span>}
            </span>
          );
        },
      }),
      ...matrix.modules.map((module) =>
        column.accessor((row) => moduleRank[row.modules[module.slug]?.status ?? "not-started"], {
          id: `module:${module.slug}`,
          header: () => (
            <span title={module.title}>
              {module.title}
              {module.requiredForClearance && <span className="block text-xs font-normal">required</span>}
            </span>
          ),
          cell: (info) => {
            const cell = info.row.original.modules[module.slug];
            if (!cell) return null;
            return (
              <span className="flex flex-col items-start gap-1" title={moduleStatusLabels[cell.status].label}>
                <StatusBadge
                  tone={moduleStatusTones[cell.status]}
                  icon={moduleStatusLabels[cell.status].icon}
                  label={rosterCellLabels[cell.status]}
                />
                {cell.expiresOn && (
                  <span className="text-xs text-slate-700">
                    {expiryVerb(cell.expiresOn, matrix.today)} {shortDate(cell.expiresOn)}
                  </span>
                )}
              </span>
            );
          },
        }),
      ),
      column.accessor("waitingForMe", {
        id: "waiting",
        header: "For my sign-off",
        sortDescFirst: true,
        cell: (info) =>
          info.getValue() > 0 ? (
            <Link href="/roster/sign-offs" className="font-semibold text-river-700 underline">
              <span aria-hidden="true">◔ </span>
              {info.getValue()} waiting
            </Link>
          ) : (
            <span className="text-slate-700">none</span>
          ),
      }),
    ];
  }, [matrix]);

  // eslint-disable-next-line react-hooks/incompatible-library -- TanStack Table returns new functions each render by design.
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getRowId: (row) => String(row.id),
  });

  if (load.state === "loading") return <LoadingState label="Loading the roster…" />;
  if (load.state === "failed") return <Notice tone="error" title={load.message} />;
  const total = load.matrix.athletes.length;
  const exportHref = `/api/roster/matrix/export?${new URLSearchParams({ filter, q: search }).toString()}`;

  return (
    <div className="space-y-4">
      <div className="grid grid-cols-1 gap-3 rounded-lg bg-white p-4 shadow-sm sm:grid-cols-[1fr_1fr_auto] sm:items-end">
        <div className="flex flex-col gap-1">
          <label htmlFor={searchId} className="font-semibold">
            Search by name
          </label>
          <input
            id={searchId}
            type="search"
            value={search}
            onChange={(event) => setSearch(event.target.value)}
            className="min-h-11 rounded-md border border-slate-500 px-3 py-2"
            autoComplete="off"
          />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor={filterId} className="font-semibold">
            Show
          </label>
          <select
            id={filterId}
            value={filter}
            onChange={(event) => setFilter(event.target.value as RosterFilter)}
            className="min-h-11 rounded-md border border-slate-500 bg-white px-3 py-2"
          >
            {rosterFilters.map((value) => (
              <option key={value} value={value}>
                {rosterFilterLabels[value]}
              </option>
            ))}
          </select>
        </div>
        <a
          href={exportHref}
          className="inline-flex min-h-11 items-center justify-center rounded-md border border-river-700 px-4 font-semibold text-river-800 hover:bg-river-100"
        >
          Download CSV
        </a>
      </div>

      <LiveStatus testId="roster-count">
        <p className="text-sm text-slate-700">
          Showing {rows.length} of {total} athletes.
        </p>
      </LiveStatus>

      {total === 0 ? (
        <p>No athletes yet. A club administrator can invite them from the Club page.</p>
      ) : rows.length === 0 ? (
        <p data-testid="roster-empty">No athletes match. Clear the search or choose &quot;Everyone&quot;.</p>
      ) : (
        <div
          className="relative overflow-x-auto rounded-lg bg-white shadow-sm"
          role="region"
          aria-label="Roster table, scrolls sideways"
          tabIndex={0}
        >
          <table className="min-w-full border-collapse text-sm" data-testid="roster-table">
            <caption className="sr-only">Athletes and the state of each module; column headers sort the table.</caption>
            <thead>
              {table.getHeaderGroups().map((group) => (
                <tr key={group.id} className="border-b border-slate-300 bg-river-50 text-left align-bottom">
                  {group.headers.map((header, index) => (
                    <th
                      key={header.id}
                      scope="col"
                      aria-sort={
                        header.column.getIsSorted() === "asc" ? "ascending" : header.column.getIsSorted() === "desc" ? "descending" : "none"
                      }
                      className={`px-3 py-2 font-semibold ${index === 0 ? "sticky left-0 z-10 bg-river-50" : ""}`}
                    >
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="flex min-h-11 items-end gap-1 text-left"
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <SortMark direction={header.column.getIsSorted()} />
                      </button>
                    </th>
                  ))}
                </tr>
              ))}
            </thead>
            <tbody>
              {table.getRowModel().rows.map((row) => (
                <tr key={row.id} className="border-b border-slate-200 align-top" data-testid={`roster-row-${row.original.id}`}>
                  {row.getVisibleCells().map((cell, index) =>
                    index === 0 ? (
                      <th key={cell.id} scope="row" className="sticky left-0 z-10 bg-white px-3 py-2 text-left font-normal">
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </th>
                    ) : (
                      <td key={cell.id} className="px-3 py-2">
                        {flexRender(cell.column.columnDef.cell, cell.getContext())}
                      </td>
                    ),
                  )}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
