import type { Metadata } from "next";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { requireUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/roles";
import { getQueryClient } from "@/lib/query-client";
import { specKeys } from "@/lib/queries/specs";
import { getProfile } from "@/lib/server/profile";
import { listSpecs } from "@/lib/server/specs";
import { getPartOilAllowances } from "@/lib/server/oil-allowances";
import { SERVICE_SOURCES } from "@/lib/service/sources";
import { SpecTable } from "@/components/specs/spec-table";
import { SpecImport } from "@/components/specs/spec-import";
import { OilAllowancesForm } from "@/components/specs/oil-allowances-form";

export const metadata: Metadata = { title: "Spec table" };

export default async function SpecsPage() {
  const user = await requireUser("specs:read");
  // Every figure in the reader's own units, as on every other screen (their profile over the shop's).
  const [{ units }, specs, allowances] = await Promise.all([
    getProfile({ user }),
    listSpecs({ shopId: user.shopId }),
    getPartOilAllowances({ shopId: user.shopId }),
  ]);
  const queryClient = getQueryClient();
  queryClient.setQueryData(specKeys.list(""), specs);
  const canEdit = can(user.role, "specs:edit");
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Spec table</h1>
      <p className="text-ink-soft">
        The shop&apos;s own figures for each vehicle variant. The under-hood label and the vehicle
        maker&apos;s service information come first; a row here is the fallback and a cross-check.
      </p>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <SpecTable canEdit={canEdit} mass={units.mass} volume={units.volume} />
        {canEdit && <SpecImport />}
      </HydrationBoundary>
      <OilAllowancesForm
        initial={allowances}
        volume={units.volume}
        canEdit={canEdit}
        source={SERVICE_SOURCES.partOilAllowance}
      />
    </div>
  );
}
