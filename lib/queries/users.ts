import { queryOptions } from "@tanstack/react-query";
import type { UserListResponse } from "@/lib/contracts/users";
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
