"use client";

import Link from "next/link";
import { useQuery } from "@tanstack/react-query";
import { similarCasesQuery } from "@/lib/queries/casebook";
import { neighbourSummaryLine } from "@/lib/casebook/summary";
import { confirmedCauseShortName, meteringDeviceLabel } from "@/lib/casebook/labels";
import { REPAIR_CATALOG, isRepairId } from "@/lib/repairs/catalog";
import type { SimilarCasesResponse } from "@/lib/contracts/casebook";
import { shortDate } from "./labels";

/** The shop's closed cases nearest to this one in their readings, and what each turned out to be. */
export function SimilarCasesPanel({ caseId, initial }: { caseId: number; initial?: SimilarCasesResponse }) {
  const { data, isError, error, isPending } = useQuery({
    ...similarCasesQuery(caseId),
    initialData: initial,
  });
  return (
    <section className="card" aria-labelledby="similar-heading">
      <h2 id="similar-heading" className="text-lg font-bold">
        Similar closed cases
      </h2>
      {isPending && <p className="mt-1 text-ink-soft">Looking through the shop&apos;s closed cases…</p>}
      {isError && (
        <p role="alert" className="mt-1 text-ember-700">
          {error.message}
        </p>
      )}
      {data && (
        <>
          <p className="mt-1 text-sm text-ink-soft">
            Same refrigerant ({data.refrigerant ?? "—"}) and metering device (
            {data.meteringDevice ? meteringDeviceLabel(data.meteringDevice) : "—"}
            ), nearest first in condensing and evaporating temperature, subcooling, superheat, approach,
            ambient and charge. What they turned out to be is a lead to check, not a diagnosis.
          </p>
          {data.unavailable ? (
            <p className="mt-2">{data.unavailable}</p>
          ) : data.neighbours.length === 0 ? (
            <p className="mt-2">No closed case of this shop has the same system yet.</p>
          ) : (
            <>
              {data.summary && (
                <p className="mt-2 font-bold" data-testid="similar-summary">
                  {neighbourSummaryLine(data.summary)}
                </p>
              )}
              <ol className="mt-2 space-y-2" aria-label="Nearest closed cases, nearest first">
                {data.neighbours.map((n) => (
                  <li key={n.caseId} className="rounded-card border border-paper-line p-2">
                    <Link
                      href={`/cases/${n.caseId}`}
                      className="inline-flex min-h-touch items-center font-bold underline"
                    >
                      Case {n.caseId}
                    </Link>{" "}
                    · {n.vehicle ?? "vehicle not recorded"} · closed {shortDate(n.closedAt)}
                    <span className="block">
                      Confirmed:{" "}
                      {n.confirmedCauses.length > 0
                        ? n.confirmedCauses.map(confirmedCauseShortName).join(", ")
                        : "not recorded"}
                      {n.repairIds.length > 0
                        ? ` · ${n.repairIds.map((id) => (isRepairId(id) ? REPAIR_CATALOG[id].tradeLabel : id)).join("; ")}`
                        : ""}
                    </span>
                    <span className="block text-sm text-ink-muted">
                      Distance {n.distance.toFixed(2)} (0 is the same readings)
                    </span>
                  </li>
                ))}
              </ol>
            </>
          )}
        </>
      )}
    </section>
  );
}
