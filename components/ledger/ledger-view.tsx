"use client";

import { useInfiniteQuery } from "@tanstack/react-query";
import { cylindersQuery } from "@/lib/queries/ledger";
import { CylinderList } from "./cylinder-list";
import { LedgerReport } from "./ledger-report";
import { MovementForm } from "./movement-form";
import { type LedgerViewer, MovementList } from "./movement-list";

export function LedgerView({ viewer }: { viewer: LedgerViewer }) {
  const { data } = useInfiniteQuery(cylindersQuery());
  const cylinders = data?.pages.flatMap((p) => p.cylinders) ?? [];
  return (
    <div className="space-y-6">
      <CylinderList massUnit={viewer.massUnit} canWrite={viewer.canWrite} />
      <section aria-labelledby="movements-heading" className="card">
        <h2 id="movements-heading" className="mb-3 text-xl font-bold">
          Movements
        </h2>
        <MovementList viewer={viewer} />
        {viewer.canWrite && cylinders.length > 0 && (
          <MovementForm cylinders={cylinders} massUnit={viewer.massUnit} />
        )}
      </section>
      <LedgerReport massUnit={viewer.massUnit} />
    </div>
  );
}
