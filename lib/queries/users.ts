import { queryOptions } from "@tanstack/react-query";
import type { Role } from "@/lib/auth/roles";
import { apiFetch } from "./api-fetch";

export interface ShopUserDto {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
}

export const userKeys = {
  all: ["users"] as const,
  list: () => [...userKeys.all, "list"] as const,
};

export const usersQuery = () =>
  queryOptions({
    queryKey: userKeys.list(),
    queryFn: ({ signal }) =>
      apiFetch<{ users: ShopUserDto[] }>("/api/users", { signal }).then((r) => r.users),
  });
