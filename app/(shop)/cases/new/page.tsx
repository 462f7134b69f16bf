import type { Metadata } from "next";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { requireUser } from "@/lib/auth/guard";
import { listVehicleChoices } from "@/lib/server/vehicles";
import { getQueryClient } from "@/lib/query-client";
import { vehicleKeys } from "@/lib/queries/vehicles";
import { NewCaseForm } from "@/components/cases/new-case-form";

export const metadata: Metadata = { title: "New case" };

export default async function NewCasePage() {
  const user = await requireUser("cases:write");
  const queryClient = getQueryClient();
  queryClient.setQueryData(
    vehicleKeys.choices(""),
    (await listVehicleChoices({ shopId: user.shopId })).vehicles,
  );
  return (
    <>
      <h1 className="mb-4 text-2xl font-bold">New case</h1>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <NewCaseForm />
      </HydrationBoundary>
    </>
  );
}
