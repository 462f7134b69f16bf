import type { Metadata } from "next";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { requireUser } from "@/lib/auth/guard";
import { can } from "@/lib/auth/roles";
import { getQueryClient } from "@/lib/query-client";
import { ledgerKeys } from "@/lib/queries/ledger";
import { REPORT_RECENT_MONTHS } from "@/lib/contracts/ledger";
import { getProfile } from "@/lib/server/profile";
import { ledgerPageParts, listMovementPage } from "@/lib/server/ledger";
import { cautionsFor } from "@/lib/service/cautions";
import { ledgerMassUnit } from "@/lib/service/ledger-guard";
import { LedgerView } from "@/components/ledger/ledger-view";
import { CautionsList } from "@/components/cautions/cautions-list";

export const metadata: Metadata = { title: "Ledger" };

const LEDGER_CAUTIONS: readonly string[] = [
  "recovery_cylinder_fill",
  "never_vent",
  "flammable_r1234yf",
  "defer_to_procedure",
];

export default async function LedgerPage() {
  const user = await requireUser("ledger:read");
  const shopId = user.shopId;
  const [{ cylinders, report }, movements, profile] = await Promise.all([
    // The cylinders and the report's latest months (the rest are fetched if someone asks to see every
    // month), from one check of the shop's kept lines.
    ledgerPageParts({ shopId, months: REPORT_RECENT_MONTHS }),
    listMovementPage({ shopId, query: {} }),
    getProfile({ user }),
  ]);
  const queryClient = getQueryClient();
  queryClient.setQueryData(ledgerKeys.cylinders(), { pages: [cylinders], pageParams: [null] });
  queryClient.setQueryData(ledgerKeys.movements(), { pages: [movements], pageParams: [null] });
  queryClient.setQueryData(ledgerKeys.report(REPORT_RECENT_MONTHS), report);
  return (
    <>
      <h1 className="mb-4 text-2xl font-bold">Refrigerant ledger</h1>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <LedgerView
          viewer={{
            massUnit: ledgerMassUnit(profile.units.mass),
            canWrite: can(user.role, "ledger:write"),
            canCancelAny: user.role === "owner" || user.role === "senior",
            userId: user.id,
          }}
        />
      </HydrationBoundary>
      <div className="card mt-6">
        <CautionsList
          heading="Cylinders and refrigerant"
          showHeading
          withSources
          foldNotices={false}
          cautions={cautionsFor().filter((c) => LEDGER_CAUTIONS.includes(c.id))}
        />
      </div>
    </>
  );
}
