"use client";

import { useQuery } from "@tanstack/react-query";
import { clsx } from "clsx";
import type { MassUnit } from "@/lib/units";
import { formatMass } from "@/lib/units";
import { cylindersQuery, ledgerReportQuery, movementsQuery } from "@/lib/queries/ledger";
import { AddCylinderForm, RetireButton } from "./cylinder-forms";
import { MovementForm } from "./movement-form";

const MOVEMENT_WORDS = {
  recovered_into: "Recovered into",
  charged_from: "Charged from",
  recycled: "Recycled in",
  sent_out: "Sent out from",
  adjustment: "Weighed adjustment to",
} as const;

export function LedgerView({ massUnit, canWrite }: { massUnit: MassUnit; canWrite: boolean }) {
  const { data: cylinders = [] } = useQuery(cylindersQuery());
  const { data: movements = [] } = useQuery(movementsQuery());
  const { data: report } = useQuery(ledgerReportQuery());
  const m = (g: number) => formatMass(g, massUnit);
  return (
    <div className="space-y-6">
      <section aria-labelledby="cylinders-heading" className="card">
        <h2 id="cylinders-heading" className="mb-3 text-xl font-bold">
          Cylinders
        </h2>
        {cylinders.length === 0 && (
          <p className="text-ink-soft">
            No cylinder yet. Add the shop&apos;s recovery and supply cylinders below.
          </p>
        )}
        <ul className="space-y-3">
          {cylinders.map((c) => (
            <li
              key={c.id}
              className={clsx(
                "rounded-card border-2 p-3",
                c.retired ? "border-paper-line opacity-70" : "border-paper-line",
              )}
              data-testid={`cylinder-${c.label}`}
            >
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <p className="font-bold">
                  {c.label} · {c.refrigerant} · {c.kind}
                  {c.retired ? " (retired)" : ""}
                </p>
                {canWrite && <RetireButton id={c.id} retired={c.retired} label={c.label} />}
              </div>
              <p>
                Holds <strong data-testid="cylinder-net">{m(c.netG)}</strong> of {m(c.capacityG)} · gross{" "}
                {m(c.grossG)} (tare {m(c.tareG)})
              </p>
              <meter
                className="mt-1 h-4 w-full"
                min={0}
                max={100}
                low={c.limitPct * 0.9}
                high={c.limitPct}
                optimum={0}
                value={Math.max(0, Math.min(100, c.fillPct))}
                aria-label={`${c.label} fill level`}
              />
              <p
                className={clsx(
                  "text-sm",
                  c.fillPct > c.limitPct ? "font-bold text-ember-700" : "text-ink-soft",
                )}
              >
                {c.fillMessage}
              </p>
              {c.problems
                .filter((p) => p !== c.fillMessage)
                .map((p) => (
                  <p key={p} className="field-error">
                    {p}
                  </p>
                ))}
            </li>
          ))}
        </ul>
        {canWrite && <AddCylinderForm massUnit={massUnit} />}
      </section>

      <section aria-labelledby="movements-heading" className="card">
        <h2 id="movements-heading" className="mb-3 text-xl font-bold">
          Movements
        </h2>
        <p className="mb-2 text-ink-soft">
          Every recovery and recharge a service record saves is posted here. A change is never erased: the old
          line is cancelled by a correction.
        </p>
        {movements.length === 0 && <p className="text-ink-soft">Nothing posted yet.</p>}
        <ul className="divide-y divide-paper-line" data-testid="movement-list">
          {movements.map((mv) => (
            <li key={mv.id} className={clsx("py-2", (mv.reversedById || mv.reversesId) && "text-ink-soft")}>
              <p>
                <span className="font-bold">
                  {mv.reversesId ? `Correction cancelling #${mv.reversesId}: ` : ""}
                  {MOVEMENT_WORDS[mv.type]} {mv.cylinderLabel}
                </span>{" "}
                · {m(Math.abs(mv.massG))}
                {mv.type === "adjustment" && mv.massG < 0 ? " out" : ""} · {mv.refrigerant}
              </p>
              <p className="text-sm">
                #{mv.id} · {new Date(mv.occurredAt).toLocaleString()} · {mv.technician}
                {mv.caseId ? ` · case ${mv.caseId}` : ""}
                {mv.reversedById ? ` · cancelled by #${mv.reversedById}` : ""}
                {mv.destination ? ` · to ${mv.destination}` : ""}
                {mv.note ? ` · ${mv.note}` : ""}
              </p>
            </li>
          ))}
        </ul>
        {canWrite && cylinders.length > 0 && <MovementForm cylinders={cylinders} massUnit={massUnit} />}
      </section>

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
          {report ? ` (months in ${report.timeZone})` : ""}. Keep it with the shop&apos;s certification and
          environmental records.
        </p>
        <div className="overflow-x-auto">
          <table className="w-full text-left">
            <thead>
              <tr className="border-b-2 border-paper-line">
                <th className="p-2">Month</th>
                <th className="p-2">Technician</th>
                <th className="p-2">Refrigerant</th>
                <th className="p-2">Recovered</th>
                <th className="p-2">Recycled</th>
                <th className="p-2">Charged</th>
                <th className="p-2">Sent out</th>
              </tr>
            </thead>
            <tbody>
              {(report?.rows ?? []).map((r) => (
                <tr
                  key={`${r.month}-${r.technicianId}-${r.refrigerant}`}
                  className="border-b border-paper-line"
                >
                  <td className="p-2">{r.month}</td>
                  <td className="p-2">{r.technician}</td>
                  <td className="p-2">{r.refrigerant}</td>
                  <td className="p-2">{m(r.recoveredG)}</td>
                  <td className="p-2">{m(r.recycledG)}</td>
                  <td className="p-2">{m(r.chargedG)}</td>
                  <td className="p-2">{m(r.sentOutG)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>
    </div>
  );
}
