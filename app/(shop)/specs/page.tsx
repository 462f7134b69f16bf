import type { Metadata } from "next";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { requireUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/roles";
import { getQueryClient } from "@/lib/query-client";
import { specKeys } from "@/lib/queries/specs";
import { getShop } from "@/lib/server/shops";
import { listSpecs } from "@/lib/server/specs";
import { getPartOilAllowances } from "@/lib/server/oil-allowances";
import { REPLACED_PART_IDS, REPLACED_PART_LABELS } from "@/lib/service/oil";
import { SERVICE_SOURCES } from "@/lib/service/sources";
import { formatVolume } from "@/lib/units";
import { SpecTable } from "@/components/specs/spec-table";
import { SpecImport } from "@/components/specs/spec-import";

export const metadata: Metadata = { title: "Spec table" };

export default async function SpecsPage() {
  const user = await requireUser("specs:read");
  const [shop, specs, allowances] = await Promise.all([getShop({ shopId: user.shopId }), listSpecs({ shopId: user.shopId }), getPartOilAllowances({ shopId: user.shopId })]);
  const queryClient = getQueryClient();
  queryClient.setQueryData(specKeys.list(""), specs);
  const imperial = shop.units === "imperial";
  const canEdit = can(user.role, "specs:edit");
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Spec table</h1>
      <p className="text-ink-soft">
        The shop&apos;s own figures for each vehicle variant. The under-hood label and the vehicle maker&apos;s service information come first; a row here is the fallback and a cross-check.
      </p>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <SpecTable canEdit={canEdit} mass={imperial ? "oz" : "g"} volume={imperial ? "floz" : "mL"} />
        {canEdit && <SpecImport />}
      </HydrationBoundary>
      <section aria-labelledby="allowances-heading" className="card">
        <h2 id="allowances-heading" className="text-xl font-bold">Oil carried out by replaced parts</h2>
        <ul className="mt-2 grid grid-cols-2 gap-1">
          {REPLACED_PART_IDS.map((p) => (
            <li key={p}>
              {REPLACED_PART_LABELS[p]}: {allowances[p] == null ? "drain and measure" : formatVolume(allowances[p] ?? 0, imperial ? "floz" : "mL")}
            </li>
          ))}
        </ul>
        <p className="mt-2 text-sm text-ink-soft">Source: {SERVICE_SOURCES.partOilAllowance}.</p>
      </section>
    </div>
  );
}
