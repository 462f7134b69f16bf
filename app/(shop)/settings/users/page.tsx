import type { Metadata } from "next";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { requireUser } from "@/lib/auth/guard";
import { listUsers } from "@/lib/server/users";
import { getQueryClient } from "@/lib/query-client";
import { userKeys } from "@/lib/queries/users";
import { PeopleManager } from "@/components/people/people-manager";

export const metadata: Metadata = { title: "People" };

export default async function UsersPage() {
  const user = await requireUser("users:manage");
  const queryClient = getQueryClient();
  queryClient.setQueryData(userKeys.list(), await listUsers({ shopId: user.shopId }));
  return (
    <>
      <h1 className="mb-4 text-2xl font-bold">People and roles</h1>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <PeopleManager currentUserId={user.id} />
      </HydrationBoundary>
    </>
  );
}
