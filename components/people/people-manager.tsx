"use client";

import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/auth/roles";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import type { ShopUser, UpdateUserInput, UserResponse } from "@/lib/contracts/users";
import { userKeys, usersQuery } from "@/lib/queries/users";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { InvitePersonForm } from "./invite-person-form";
import { ResetPassword } from "./reset-password";
import { OpenInvitations } from "./open-invitations";

export function PeopleManager({ currentUserId }: { currentUserId: string }) {
  const { data: users = [] } = useQuery(usersQuery());
  const queryClient = useQueryClient();
  const [message, setMessage] = useState<string | null>(null);
  const [deactivating, setDeactivating] = useState<ShopUser | null>(null);
  const update = useMutation({
    mutationFn: ({ id, ...body }: { id: string } & UpdateUserInput) =>
      apiFetch<UserResponse>(`/api/users/${id}`, { method: "PATCH", body }),
    onSuccess: ({ user }) => {
      setMessage(
        `${user.name} is now ${ROLE_LABELS[user.role].toLowerCase()}${user.active ? "" : " (inactive)"}.`,
      );
      setDeactivating(null);
      return queryClient.invalidateQueries({ queryKey: userKeys.all });
    },
    onError: (error) => setMessage(error instanceof ApiError ? error.message : "The change was not saved."),
  });

  return (
    <div className="space-y-6">
      <section aria-labelledby="people-heading" className="card">
        <h2 id="people-heading" className="mb-3 text-xl font-bold">
          The shop&apos;s people
        </h2>
        <ul className="divide-y divide-paper-line">
          {users.map((u) => (
            <li key={u.id} className="flex flex-wrap items-center gap-3 py-3">
              <div className="min-w-0 flex-1">
                <p className="font-bold">
                  {u.name} {!u.active && <span className="text-ember-700">(inactive)</span>}
                </p>
                <p className="break-all text-ink-soft">{u.email}</p>
              </div>
              <label className="sr-only" htmlFor={`role-${u.id}`}>
                Role of {u.name}
              </label>
              <select
                id={`role-${u.id}`}
                className="field-input w-auto"
                value={u.role}
                disabled={u.id === currentUserId || update.isPending}
                onChange={(e) => update.mutate({ id: u.id, role: e.target.value as Role })}
              >
                {ROLES.map((r) => (
                  <option key={r} value={r}>
                    {ROLE_LABELS[r]}
                  </option>
                ))}
              </select>
              {u.id !== currentUserId && u.active && <ResetPassword person={u} />}
              {u.id !== currentUserId && (
                <button
                  type="button"
                  className="btn-quiet"
                  onClick={() => {
                    setMessage(null);
                    if (u.active) setDeactivating(u);
                    else update.mutate({ id: u.id, active: true });
                  }}
                  aria-label={`${u.active ? "Deactivate" : "Reactivate"} ${u.name}`}
                >
                  {u.active ? "Deactivate…" : "Reactivate"}
                </button>
              )}
            </li>
          ))}
        </ul>
        <p role="status" className="mt-2 min-h-6 text-ink-soft">
          {message}
        </p>
        <ConfirmDialog
          open={deactivating !== null}
          title={deactivating ? `Deactivate ${deactivating.name}?` : "Deactivate a person?"}
          confirmLabel="Deactivate"
          danger
          busy={update.isPending}
          error={deactivating && update.error ? message : null}
          onConfirm={() => deactivating && update.mutate({ id: deactivating.id, active: false })}
          onCancel={() => setDeactivating(null)}
        >
          {deactivating && (
            <p>
              {deactivating.name} ({deactivating.email}) is signed out everywhere and can no longer sign in.
              Their cases, records and ledger lines stay as they are. You can reactivate them later.
            </p>
          )}
        </ConfirmDialog>
      </section>
      <OpenInvitations />
      <InvitePersonForm />
    </div>
  );
}
