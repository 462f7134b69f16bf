"use client";

import Link from "next/link";
import { FlexRender, tableFeatures, useTable, type ColumnDef } from "@tanstack/react-table";
import type { CasebookRow, CasebookSearchResponse, CasebookSort } from "@/lib/contracts/casebook";
import { CAUSE_SHORT_NAMES, type CauseId } from "@/lib/diagnosis/causes";
import { confirmedCauseShortName } from "@/lib/casebook/labels";
import { sortParams, withParams, type CasebookParams } from "@/lib/casebook/url";
import { StatusBadge } from "@/components/cases/status-badge";
import { ComebackBadge } from "./comeback-badge";
import { shortDate } from "./labels";

const features = tableFeatures({});

const suspectName = (id: string | null) => (id ? (CAUSE_SHORT_NAMES[id as CauseId] ?? id) : "—");
const confirmedNames = (row: CasebookRow) =>
  row.confirmedCauses.length > 0 ? row.confirmedCauses.map(confirmedCauseShortName).join(", ") : "—";

/** Columns the server can sort by; the others show what the case holds. */
const SORT_OF: Partial<Record<string, CasebookSort>> = {
  opened: "opened_at",
  vehicle: "vehicle",
  status: "status",
};

const columns: ColumnDef<typeof features, CasebookRow>[] = [
  {
    id: "case",
    header: "Case",
    cell: ({ row }) => (
      <Link href={`/cases/${row.original.caseId}`} className="font-bold underline">
        {row.original.caseId}
      </Link>
    ),
  },
  {
    id: "opened",
    header: "Opened",
    cell: ({ row }) => <span className="whitespace-nowrap">{shortDate(row.original.openedAt)}</span>,
  },
  { id: "vehicle", header: "Vehicle", cell: ({ row }) => row.original.vehicle ?? "—" },
  {
    id: "complaint",
    header: "Complaint",
    cell: ({ row }) => <span className="line-clamp-2">{row.original.complaint}</span>,
  },
  { id: "suspect", header: "Leading suspect", cell: ({ row }) => suspectName(row.original.leadingSuspect) },
  { id: "confirmed", header: "Confirmed", cell: ({ row }) => confirmedNames(row.original) },
  { id: "technician", header: "Technician", cell: ({ row }) => row.original.technician },
  {
    id: "status",
    header: "Status",
    cell: ({ row }) => (
      <span className="flex flex-col items-start gap-1">
        <StatusBadge status={row.original.status} />
        <ComebackBadge
          comebackOfCaseId={row.original.comebackOfCaseId}
          cameBackCaseId={row.original.cameBackCaseId}
        />
      </span>
    ),
  },
];

const SORT_LABELS: Record<CasebookSort, string> = {
  relevance: "Best match",
  opened_at: "Date opened",
  closed_at: "Date closed",
  vehicle: "Vehicle",
  status: "Status",
};

/** The results: a sortable table on a wide screen, cards on a phone, and the pages. */
export function CasebookResults({
  data,
  params,
  onChange,
}: {
  data: CasebookSearchResponse;
  params: CasebookParams;
  onChange: (next: CasebookParams) => void;
}) {
  const table = useTable({ features, columns, data: data.rows });
  const pages = Math.max(1, Math.ceil(data.total / data.pageSize));
  const sorts: CasebookSort[] = params.q
    ? ["relevance", "opened_at", "closed_at", "vehicle", "status"]
    : ["opened_at", "closed_at", "vehicle", "status"];

  if (data.rows.length === 0)
    return (
      <p className="card text-ink-soft">
        {data.total === 0
          ? "No case of this shop matches. Fewer words or filters find more."
          : "No cases on this page."}
      </p>
    );

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-2 md:hidden">
        <div className="flex-1">
          <label htmlFor="casebook-sort" className="field-label">
            Sort by
          </label>
          <select
            id="casebook-sort"
            className="field-input"
            value={`${data.sort}:${data.dir}`}
            onChange={(e) => {
              const [sort, dir] = e.target.value.split(":") as [CasebookSort, "asc" | "desc"];
              onChange(withParams(params, { sort, dir }));
            }}
          >
            {sorts.flatMap((s) =>
              s === "relevance"
                ? [
                    <option key={s} value={`${s}:desc`}>
                      {SORT_LABELS[s]}
                    </option>,
                  ]
                : [
                    <option key={`${s}:desc`} value={`${s}:desc`}>
                      {SORT_LABELS[s]}, {s === "vehicle" || s === "status" ? "Z to A" : "newest first"}
                    </option>,
                    <option key={`${s}:asc`} value={`${s}:asc`}>
                      {SORT_LABELS[s]}, {s === "vehicle" || s === "status" ? "A to Z" : "oldest first"}
                    </option>,
                  ],
            )}
          </select>
        </div>
      </div>

      <ul className="space-y-3 md:hidden" aria-label="Cases found">
        {data.rows.map((r) => (
          <li key={r.caseId}>
            <Link href={`/cases/${r.caseId}`} className="card block hover:border-glacier-500">
              <span className="flex flex-wrap items-center justify-between gap-2">
                <span className="font-bold">
                  Case {r.caseId} · {r.vehicle ?? "vehicle not recorded"}
                </span>
                <StatusBadge status={r.status} />
              </span>
              <span className="mt-1 line-clamp-2 block text-ink-soft">&ldquo;{r.complaint}&rdquo;</span>
              <span className="mt-1 block text-sm">
                Suspect: {suspectName(r.leadingSuspect)} · Confirmed: {confirmedNames(r)}
              </span>
              <span className="mt-1 block text-sm text-ink-muted">
                {shortDate(r.openedAt)} · {r.technician}
              </span>
              <span className="mt-1 block">
                <ComebackBadge comebackOfCaseId={r.comebackOfCaseId} cameBackCaseId={r.cameBackCaseId} />
              </span>
            </Link>
          </li>
        ))}
      </ul>

      <div className="card hidden overflow-x-auto p-0 md:block">
        <table className="w-full text-left">
          <caption className="sr-only">Cases found, {SORT_LABELS[data.sort].toLowerCase()} order</caption>
          <thead className="bg-paper-sunk">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sort = SORT_OF[header.column.id];
                  const active = sort !== undefined && data.sort === sort;
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      className="px-3 py-2 align-bottom"
                      aria-sort={active ? (data.dir === "asc" ? "ascending" : "descending") : undefined}
                    >
                      {sort ? (
                        <button
                          type="button"
                          className="inline-flex min-h-touch items-center gap-1 font-bold underline"
                          onClick={() => onChange(sortParams(params, sort, data.sort, data.dir))}
                        >
                          <FlexRender header={header} />
                          <span aria-hidden="true">{active ? (data.dir === "asc" ? "▲" : "▼") : "↕"}</span>
                        </button>
                      ) : (
                        <FlexRender header={header} />
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="border-t border-paper-line align-top">
                {row.getAllCells().map((cell) => (
                  <td key={cell.id} className="px-3 py-2">
                    <FlexRender cell={cell} />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <nav aria-label="Pages" className="flex flex-wrap items-center justify-between gap-2">
        <button
          type="button"
          className="btn-quiet"
          disabled={data.page <= 1}
          onClick={() => onChange(withParams(params, { page: String(data.page - 1) }))}
        >
          Previous page
        </button>
        <span>
          Page {data.page} of {pages.toLocaleString("en")}
        </span>
        <button
          type="button"
          className="btn-quiet"
          disabled={data.page >= pages}
          onClick={() => onChange(withParams(params, { page: String(data.page + 1) }))}
        >
          Next page
        </button>
      </nav>
    </div>
  );
}
