"use client";

import { useInfiniteQuery } from "@tanstack/react-query";
import { clsx } from "clsx";
import { fillSentence } from "@/lib/service/ledger-guard";
import { type MassUnit, formatMassGrouped } from "@/lib/units";
import { cylindersQuery } from "@/lib/queries/ledger";
import { AddCylinderForm, RetireButton } from "./cylinder-forms";
import { MoreButton } from "@/components/ui/more-button";

export function CylinderList({ massUnit, canWrite }: { massUnit: MassUnit; canWrite: boolean }) {
  const { data, fetchNextPage, hasNextPage, isFetchingNextPage } = useInfiniteQuery(cylindersQuery());
  const cylinders = data?.pages.flatMap((p) => p.cylinders) ?? [];
  const m = (g: number) => formatMassGrouped(g, massUnit);
  return (
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
        {cylinders.map((c) => {
          const fill = fillSentence(c, massUnit);
          return (
            <li
              key={c.id}
              className={clsx("rounded-card border-2 border-paper-line p-3", c.retired && "opacity-70")}
              data-testid={`cylinder-${c.label}`}
            >
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <p className="font-bold">
                  {c.label} · {c.refrigerant} · {c.kind}
                  {c.retired ? " (retired)" : ""}
                </p>
                {canWrite && <RetireButton cylinder={c} massUnit={massUnit} />}
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
              <p className={clsx("text-sm", c.roomG < 0 ? "font-bold text-ember-700" : "text-ink-soft")}>
                {fill}
              </p>
              {c.problems
                .filter((p) => p !== c.fillMessage)
                .map((p) => (
                  <p key={p} className="field-error">
                    {p}
                  </p>
                ))}
            </li>
          );
        })}
      </ul>
      <MoreButton
        hasNextPage={hasNextPage}
        isFetchingNextPage={isFetchingNextPage}
        fetchNextPage={fetchNextPage}
        label="Show more cylinders"
      />
      {canWrite && <AddCylinderForm massUnit={massUnit} />}
    </section>
  );
}
