import { queryOptions } from "@tanstack/react-query";
import type { UserListResponse } from "@/lib/contracts/users";
import type { PendingInvitationDto } from "@/lib/contracts/invitations";
import { apiFetch } from "./api-fetch";

export const userKeys = {
  all: ["users"] as const,
  list: () => [...userKeys.all, "list"] as const,
};

export const usersQuery = () =>
  queryOptions({
    queryKey: userKeys.list(),
    queryFn: ({ signal }) => apiFetch<UserListResponse>("/api/users", { signal }).then((r) => r.users),
  });

export const invitationKeys = {
  all: ["invitations"] as const,
  list: () => [...invitationKeys.all, "list"] as const,
};

export const invitationsQuery = () =>
  queryOptions({
    queryKey: invitationKeys.list(),
    queryFn: ({ signal }) =>
      apiFetch<{ invitations: PendingInvitationDto[] }>("/api/invitations", { signal }).then(
        (r) => r.invitations,
      ),
  });
