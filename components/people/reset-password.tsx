"use client";

import { useState } from "react";
import { ShopTime } from "@/components/shell/shop-clock";
import { useMutation } from "@tanstack/react-query";
import type { ShopUser } from "@/lib/contracts/users";
import { TEMPORARY_PASSWORD_LIFETIME_HOURS, type PasswordResetResponse } from "@/lib/contracts/passwords";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";

/**
 * "Reset password…" for one person: asks first, then shows the temporary password this once.
 * It is kept only in this component's memory and gone when "Done" is pressed or the page left.
 */
export function ResetPassword({ person }: { person: ShopUser }) {
  const [asking, setAsking] = useState(false);
  const [shown, setShown] = useState<PasswordResetResponse | null>(null);
  const reset = useMutation({
    mutationFn: () =>
      apiFetch<PasswordResetResponse>(`/api/users/${person.id}/password-reset`, { method: "POST" }),
    onSuccess: (answer) => {
      setAsking(false);
      setShown(answer);
    },
  });
  const error = reset.error
    ? reset.error instanceof ApiError
      ? reset.error.message
      : "No answer from the server; the password was not reset. Try again."
    : null;

  return (
    <>
      <button
        type="button"
        className="btn-quiet"
        onClick={() => {
          reset.reset();
          setShown(null);
          setAsking(true);
        }}
        aria-label={`Reset the password of ${person.name}`}
      >
        Reset password…
      </button>
      {shown && (
        <div
          className="w-full rounded-card border-2 border-caution-500 bg-caution-50 p-3"
          role="region"
          aria-label={`Temporary password for ${shown.user.name}`}
        >
          <p>
            Temporary password for <strong>{shown.user.name}</strong>, shown this once:
          </p>
          <p className="my-2 select-all font-mono text-2xl tracking-wide" data-testid="temporary-password">
            {shown.temporaryPassword}
          </p>
          <p className="text-sm">
            Give it to them in person or by phone, never in a group chat. It works until{" "}
            <ShopTime iso={shown.expiresAt} />, and they must choose their own when they sign in.
            {shown.sessionsEnded > 0
              ? ` ${shown.sessionsEnded === 1 ? "One device was" : `${shown.sessionsEnded} devices were`} signed out.`
              : ""}
          </p>
          <button type="button" className="btn-quiet mt-2" onClick={() => setShown(null)}>
            Done: hide it
          </button>
        </div>
      )}
      <ConfirmDialog
        open={asking}
        title={`Reset the password of ${person.name}?`}
        confirmLabel="Reset the password"
        danger
        busy={reset.isPending}
        error={error}
        onConfirm={() => reset.mutate()}
        onCancel={() => setAsking(false)}
      >
        <p>
          Their current password stops working now and they are signed out on every device. You will see a
          temporary password once; it works for {TEMPORARY_PASSWORD_LIFETIME_HOURS} hours and they must choose
          their own when they sign in with it.
        </p>
      </ConfirmDialog>
    </>
  );
}
