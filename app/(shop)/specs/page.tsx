import type { Metadata } from "next";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { requireUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/roles";
import { getQueryClient } from "@/lib/query-client";
import { specKeys } from "@/lib/queries/specs";
import { getShop } from "@/lib/server/shops";
import { listSpecs } from "@/lib/server/specs";
import { getPartOilAllowances } from "@/lib/server/oil-allowances";
import { SERVICE_SOURCES } from "@/lib/service/sources";
import { SpecTable } from "@/components/specs/spec-table";
import { SpecImport } from "@/components/specs/spec-import";
import { OilAllowancesForm } from "@/components/specs/oil-allowances-form";

export const metadata: Metadata = { title: "Spec table" };

export default async function SpecsPage() {
  const user = await requireUser("specs:read");
  const [shop, specs, allowances] = await Promise.all([
    getShop({ shopId: user.shopId }),
    listSpecs({ shopId: user.shopId }),
    getPartOilAllowances({ shopId: user.shopId }),
  ]);
  const queryClient = getQueryClient();
  queryClient.setQueryData(specKeys.list(""), specs);
  const imperial = shop.units === "imperial";
  const canEdit = can(user.role, "specs:edit");
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Spec table</h1>
      <p className="text-ink-soft">
        The shop&apos;s own figures for each vehicle variant. The under-hood label and the vehicle
        maker&apos;s service information come first; a row here is the fallback and a cross-check.
      </p>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <SpecTable canEdit={canEdit} mass={imperial ? "oz" : "g"} volume={imperial ? "floz" : "mL"} />
        {canEdit && <SpecImport />}
      </HydrationBoundary>
      <OilAllowancesForm
        initial={allowances}
        volume={imperial ? "floz" : "mL"}
        canEdit={canEdit}
        source={SERVICE_SOURCES.partOilAllowance}
      />
    </div>
  );
}
