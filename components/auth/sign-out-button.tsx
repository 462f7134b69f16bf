"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { apiFetch } from "@/lib/queries/api-fetch";

export function SignOutButton() {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  return (
    <button
      type="button"
      className="btn shrink-0 whitespace-nowrap border-2 border-glacier-100 text-white hover:bg-glacier-700"
      disabled={pending}
      onClick={async () => {
        setPending(true);
        try {
          await apiFetch("/api/session", { method: "DELETE" });
        } finally {
          // The cached answers go with the session. The client is loaded here, not with the button:
          // the interview's first load carries none (app/(at-vehicle)/layout.tsx). When it cannot
          // load, no page has loaded it, so there is no cache to clear.
          await import("@/lib/query-client").then(
            ({ getQueryClient }) => getQueryClient().clear(),
            () => undefined,
          );
          router.replace("/sign-in");
          router.refresh();
        }
      }}
    >
      Sign out
    </button>
  );
}
