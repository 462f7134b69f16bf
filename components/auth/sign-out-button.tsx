"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useQueryClient } from "@tanstack/react-query";
import { apiFetch } from "@/lib/queries/api-fetch";

export function SignOutButton() {
  const router = useRouter();
  const queryClient = useQueryClient();
  const [pending, setPending] = useState(false);
  return (
    <button
      type="button"
      className="btn border-2 border-glacier-100 text-white hover:bg-glacier-700"
      disabled={pending}
      onClick={async () => {
        setPending(true);
        try {
          await apiFetch("/api/session", { method: "DELETE" });
        } finally {
          queryClient.clear();
          router.replace("/sign-in");
          router.refresh();
        }
      }}
    >
      Sign out
    </button>
  );
}
