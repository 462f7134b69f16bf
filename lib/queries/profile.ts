import { queryOptions } from "@tanstack/react-query";
import type { ProfileResponse } from "@/lib/contracts/profile";
import { apiFetch } from "./api-fetch";

export const profileKeys = {
  all: ["profile"] as const,
  mine: () => [...profileKeys.all, "mine"] as const,
};

export const profileQuery = () =>
  queryOptions({
    queryKey: profileKeys.mine(),
    queryFn: ({ signal }) => apiFetch<ProfileResponse>("/api/me/profile", { signal }),
  });
