"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { ShopTime } from "@/components/shell/shop-clock";
import { useState } from "react";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { invitationKeys, invitationsQuery } from "@/lib/queries/users";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";

/** Invitations nobody has taken up yet; withdrawing one makes its link stop working. */
export function OpenInvitations() {
  const { data: invitations = [] } = useQuery(invitationsQuery());
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<string | null>(null);
  const [withdrawing, setWithdrawing] = useState<{ id: number; name: string; email: string } | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const withdraw = useMutation({
    mutationFn: (id: number) => apiFetch(`/api/invitations/${id}`, { method: "DELETE" }),
    onMutate: () => setFailure(null),
    onSuccess: () => {
      setWithdrawing(null);
      setMessage("Invitation withdrawn; its link no longer works.");
      return queryClient.invalidateQueries({ queryKey: invitationKeys.all });
    },
    onError: (error) =>
      setFailure(
        error instanceof ApiError
          ? error.message
          : "No answer from the server; nothing was changed. Try again.",
      ),
  });
  if (invitations.length === 0 && !message) return null;

  return (
    <section aria-labelledby="open-invitations-heading" className="card">
      <h2 id="open-invitations-heading" className="mb-3 text-xl font-bold">
        Open invitations
      </h2>
      <ul className="divide-y divide-paper-line">
        {invitations.map((inv) => (
          <li key={inv.id} className="flex flex-wrap items-center gap-3 py-3">
            <div className="min-w-0 flex-1">
              <p className="font-bold">
                {inv.name} · {ROLE_LABELS[inv.role]}
              </p>
              <p className="break-all text-ink-soft">
                {inv.email} ·{" "}
                {inv.expired ? (
                  "link expired: invite again"
                ) : (
                  <>
                    link valid until <ShopTime iso={inv.expiresAt} />
                  </>
                )}
              </p>
            </div>
            <button
              type="button"
              className="btn-quiet"
              disabled={withdraw.isPending}
              onClick={() => {
                setMessage(null);
                setFailure(null);
                setWithdrawing({ id: inv.id, name: inv.name, email: inv.email });
              }}
            >
              Withdraw<span className="sr-only"> the invitation to {inv.email}</span>…
            </button>
          </li>
        ))}
      </ul>
      <p role="status" className="mt-2 min-h-6 text-ink-soft">
        {message}
      </p>
      <ConfirmDialog
        open={withdrawing !== null}
        title={withdrawing ? `Withdraw the invitation to ${withdrawing.email}?` : "Withdraw an invitation?"}
        confirmLabel="Withdraw the invitation"
        danger
        busy={withdraw.isPending}
        error={withdrawing ? failure : null}
        onConfirm={() => withdrawing && withdraw.mutate(withdrawing.id)}
        onCancel={() => setWithdrawing(null)}
      >
        {withdrawing && (
          <p>The link mailed to {withdrawing.name} stops working at once. You can invite them again later.</p>
        )}
      </ConfirmDialog>
    </section>
  );
}
