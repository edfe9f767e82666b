"use client";
/** A trail's reports as a sortable table (TanStack Table v9: useTable with the sorting feature). */
import { createColumnHelper, createSortedRowModel, rowSortingFeature, sortFn_alphanumeric, sortFn_basic, tableFeatures, useTable } from "@tanstack/react-table";
import { useMemo } from "react";
import { StatusLabel } from "@/components/board/status-label";
import { describeFeatures } from "@/lib/conditions/pure/labels";
import type { HistoryRow } from "@/lib/conditions/history";
import { parkLocalTime } from "@/lib/shared/park-clock";
import { formatRain } from "@/lib/weather/pure/summary";
import type { DayRain } from "@/lib/weather/pure/rules";

const features = tableFeatures({ rowSortingFeature, sortedRowModel: createSortedRowModel(), sortFns: { alphanumeric: sortFn_alphanumeric, basic: sortFn_basic } });
const helper = createColumnHelper<typeof features, HistoryRow>();
const STATUS_ORDER = { open: 0, caution: 1, closed: 2 } as const;

function columnsFor(timeZone: string, showRevisions: boolean, rainByDate?: Record<string, DayRain>) {
  return helper.columns([
    helper.accessor("date", { header: "Date", sortFn: "alphanumeric", cell: (info) => <span className="whitespace-nowrap">{info.getValue()}</span> }),
    // The day's rain (park-local day, from the stored weather): how a trail recovers after rain.
    ...(rainByDate
      ? [
          helper.accessor((r) => rainByDate[r.date]?.mm ?? -1, {
            id: "rain",
            header: "Rain that day",
            sortFn: "basic",
            cell: (info) => {
              const day = rainByDate[info.row.original.date];
              return day ? `${formatRain(day.mm)}${day.partial ? " so far" : ""}` : "–";
            },
          }),
        ]
      : []),
    helper.accessor((r) => STATUS_ORDER[r.status], {
      id: "status",
      header: "Status",
      sortFn: "basic",
      cell: (info) => <StatusLabel status={info.row.original.status} size="sm" />,
    }),
    helper.accessor("reason", { header: "Reason", enableSorting: false, cell: (info) => info.getValue() ?? "" }),
    helper.accessor((r) => r.surfaces.join(", "), { id: "surfaces", header: "Surfaces", sortFn: "alphanumeric" }),
    helper.accessor((r) => describeFeatures(r.features), { id: "features", header: "Features", enableSorting: false }),
    helper.accessor("note", { header: "Note", enableSorting: false, cell: (info) => info.getValue() ?? "" }),
    helper.accessor("reportedAt", { header: "Inspected", sortFn: "alphanumeric", cell: (info) => parkLocalTime(new Date(info.getValue()), timeZone) }),
    helper.accessor("reporterName", { header: "By", enableSorting: false, cell: (info) => info.getValue() ?? "" }),
    ...(showRevisions
      ? [helper.accessor((r) => r.revision, { id: "revision", header: "Revision", sortFn: "basic", cell: (info) => `${info.getValue()}${info.row.original.isCurrent ? " (current)" : ""}` })]
      : []),
  ]);
}

/** `rainByDate` (YYYY-MM-DD → mm, today's partial) adds the day's rain beside its reports; a day without stored weather shows "–". */
export function HistoryTable({ rows, timeZone, showRevisions, rainByDate }: { rows: HistoryRow[]; timeZone: string; showRevisions: boolean; rainByDate?: Record<string, DayRain> }) {
  const columns = useMemo(() => columnsFor(timeZone, showRevisions, rainByDate), [timeZone, showRevisions, rainByDate]);
  const table = useTable({ features, columns, data: rows, enableSortingRemoval: false, initialState: { sorting: [{ id: "date", desc: true }] } });
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[640px] border-collapse text-left text-sm" data-testid="history-table">
        <thead>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id} className="border-b-2 border-loam-300">
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th key={header.id} scope="col" className="px-2 py-1" aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}>
                    {header.column.getCanSort() ? (
                      <button type="button" className="inline-flex min-h-tap items-center gap-1 font-semibold" onClick={header.column.getToggleSortingHandler()}>
                        <table.FlexRender header={header} />
                        <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
                      </button>
                    ) : (
                      <table.FlexRender header={header} />
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-loam-100 align-top">
              {row.getAllCells().map((cell) => (
                <td key={cell.id} className="px-2 py-2">
                  <table.FlexRender cell={cell} />
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
