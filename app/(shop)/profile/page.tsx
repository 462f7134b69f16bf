import type { Metadata } from "next";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { requireUser } from "@/lib/auth/guard";
import { getProfile } from "@/lib/server/profile";
import { getQueryClient } from "@/lib/query-client";
import { profileKeys } from "@/lib/queries/profile";
import { UnitsForm } from "@/components/profile/units-form";

export const metadata: Metadata = { title: "Your units" };

export default async function ProfilePage() {
  const user = await requireUser("cases:read");
  const queryClient = getQueryClient();
  queryClient.setQueryData(profileKeys.mine(), await getProfile({ user }));
  return (
    <>
      <h1 className="mb-1 text-2xl font-bold">Your units</h1>
      <p className="mb-4 text-ink-soft">
        Set once: every reading you type starts in these units, and every number you read is said in them.
      </p>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <UnitsForm />
      </HydrationBoundary>
    </>
  );
}
