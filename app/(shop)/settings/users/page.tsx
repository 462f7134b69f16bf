import type { Metadata } from "next";
import { dehydrate, HydrationBoundary } from "@tanstack/react-query";
import { requireUser } from "@/lib/auth/guard";
import { listUsers } from "@/lib/server/users";
import { listInvitations } from "@/lib/server/invitations";
import { getQueryClient } from "@/lib/query-client";
import { invitationKeys, userKeys } from "@/lib/queries/users";
import { PeopleManager } from "@/components/people/people-manager";

export const metadata: Metadata = { title: "People" };

export default async function UsersPage() {
  const user = await requireUser("users:manage");
  const queryClient = getQueryClient();
  queryClient.setQueryData(userKeys.list(), (await listUsers({ shopId: user.shopId })).users);
  queryClient.setQueryData(invitationKeys.list(), await listInvitations({ shopId: user.shopId }));
  return (
    <>
      <h1 className="mb-4 text-2xl font-bold">People and roles</h1>
      <HydrationBoundary state={dehydrate(queryClient)}>
        <PeopleManager currentUserId={user.id} />
      </HydrationBoundary>
    </>
  );
}
