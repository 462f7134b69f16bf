"use client";

import { Fragment, useState } from "react";
import { useQuery } from "@tanstack/react-query";
import { type MassUnit, formatMassGrouped } from "@/lib/units";
import { REPORT_RECENT_MONTHS, type LedgerReportRow } from "@/lib/contracts/ledger";
import { latestMonths } from "@/lib/service/report-months";
import { ledgerReportQuery } from "@/lib/queries/ledger";

// Months shown at first: a shop's whole history is hundreds of rows, most of them read only in the CSV.
// The page brings only those; the rest are asked for when someone shows every month.
export { REPORT_RECENT_MONTHS };

/** The monthly figures, the same rows and corrections the CSV carries. */
export function LedgerReport({ massUnit }: { massUnit: MassUnit }) {
  const [allMonths, setAllMonths] = useState(false);
  const { data: latest } = useQuery(ledgerReportQuery(REPORT_RECENT_MONTHS));
  const { data: every } = useQuery({
    ...ledgerReportQuery(),
    enabled: allMonths,
  });
  const report = (allMonths ? every : undefined) ?? latest;
  const m = (g: number) => formatMassGrouped(g, massUnit);
  // The latest months are the ones a technician checks; the rest wait behind a button and in the CSV.
  const recent = latestMonths(latest?.rows ?? [], REPORT_RECENT_MONTHS);
  const rows = allMonths && every ? every.rows : recent.rows;
  const monthCount = latest?.monthCount ?? recent.monthCount;
  const key = (r: LedgerReportRow) => `${r.month}-${r.technicianId}-${r.refrigerant}`;
  // The CSV's columns, in its order.
  const figures = (r: LedgerReportRow): [string, string][] => [
    ["Recovered", m(r.recoveredG)],
    ["Recycled", m(r.recycledG)],
    ["Charged", m(r.chargedG)],
    ["Sent out", m(r.sentOutG)],
    ["Weighed adjustments", m(r.adjustmentG)],
    ["Corrections", r.corrections === 0 ? "none" : `${r.corrections} netted in`],
  ];
  return (
    <section aria-labelledby="report-heading" className="card">
      <div className="mb-3 flex flex-wrap items-center justify-between gap-2">
        <h2 id="report-heading" className="text-xl font-bold">
          Monthly report
        </h2>
        <a className="btn-quiet" href="/api/ledger/report?format=csv" download>
          Export CSV
        </a>
      </div>
      <p className="mb-2 text-ink-soft">
        Refrigerant recovered, recycled, charged and sent out, per month, technician and refrigerant
        {report ? ` (months in ${report.timeZone})` : ""}. A correction counts in the month of the line it
        cancels, so a past month shows what really happened. Keep it with the shop&apos;s certification and
        environmental records.
      </p>
      <div data-testid="ledger-report">
        {rows.length === 0 && <p className="text-ink-soft">Nothing posted yet.</p>}
        {monthCount > REPORT_RECENT_MONTHS && (
          <p className="mb-3 flex flex-wrap items-center gap-2">
            <span className="text-ink-soft">
              {allMonths
                ? every
                  ? `All ${monthCount} months.`
                  : `Fetching all ${monthCount} months…`
                : `The last ${REPORT_RECENT_MONTHS} months. The CSV holds all ${monthCount}.`}
            </span>
            <button type="button" className="btn-quiet" onClick={() => setAllMonths((shown) => !shown)}>
              {allMonths ? `Show the last ${REPORT_RECENT_MONTHS} months` : `Show all ${monthCount} months`}
            </button>
          </p>
        )}
        {/* A phone gets one card per row; a wider screen the table. */}
        <ul className="space-y-3 sm:hidden">
          {rows.map((r) => (
            <li key={key(r)} className="rounded-card border-2 border-paper-line p-3">
              <p className="font-bold">
                {r.month} · {r.technician} · {r.refrigerant}
              </p>
              <dl className="mt-1 grid grid-cols-2 gap-x-3">
                {figures(r).map(([label, value]) => (
                  // dt and dd straight in the grid: a wrapper per pair (display: contents) drew nothing.
                  <Fragment key={label}>
                    <dt className="text-ink-soft">{label}</dt>
                    <dd className="text-right">{value}</dd>
                  </Fragment>
                ))}
              </dl>
            </li>
          ))}
        </ul>
        {rows.length > 0 && (
          <div className="hidden overflow-x-auto sm:block">
            <table className="w-full text-left">
              <thead>
                <tr className="border-b-2 border-paper-line">
                  <th className="p-2">Month</th>
                  <th className="p-2">Technician</th>
                  <th className="p-2">Refrigerant</th>
                  {figures(rows[0]!).map(([label]) => (
                    <th key={label} className="p-2">
                      {label}
                    </th>
                  ))}
                </tr>
              </thead>
              <tbody>
                {rows.map((r) => (
                  <tr key={key(r)} className="border-b border-paper-line">
                    <td className="p-2">{r.month}</td>
                    <td className="p-2">{r.technician}</td>
                    <td className="p-2">{r.refrigerant}</td>
                    {figures(r).map(([label, value]) => (
                      <td key={label} className="p-2">
                        {value}
                      </td>
                    ))}
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
        )}
      </div>
    </section>
  );
}
