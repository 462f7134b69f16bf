"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import {
  INVITATION_LIFETIME_DAYS,
  inviteUserSchema,
  type InvitationSentDto,
  type InviteUserInput,
} from "@/lib/contracts/invitations";
import { ROLE_LABELS, ROLES } from "@/lib/auth/roles";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { invitationKeys } from "@/lib/queries/users";
import { TextField } from "@/components/ui/text-field";

export function InvitePersonForm() {
  const queryClient = useQueryClient();
  const [done, setDone] = useState<string | null>(null);
  const form = useForm<InviteUserInput>({
    resolver: zodResolver(inviteUserSchema),
    defaultValues: { email: "", name: "", role: "technician" },
  });
  const invite = useMutation({
    mutationFn: (body: InviteUserInput) =>
      apiFetch<InvitationSentDto>("/api/invitations", { method: "POST", body }),
    onSuccess: (sent, body) => {
      setDone(
        `${sent.message} ${body.name} chooses a password through the link in it, within ${INVITATION_LIFETIME_DAYS} days.`,
      );
      form.reset({ email: "", name: "", role: body.role });
      return queryClient.invalidateQueries({ queryKey: invitationKeys.all });
    },
    onError: (error) => {
      if (error instanceof ApiError) {
        for (const [field, messages] of Object.entries(error.fieldErrors ?? {})) {
          form.setError(field as keyof InviteUserInput, { message: messages[0] });
        }
        form.setError("root", { message: error.message });
      } else {
        form.setError("root", { message: "No answer from the server; your entries are kept. Try again." });
      }
    },
  });
  const { errors } = form.formState;

  return (
    <section aria-labelledby="invite-person-heading" className="card">
      <h2 id="invite-person-heading" className="mb-1 text-xl font-bold">
        Invite a person
      </h2>
      <p className="mb-3 text-ink-soft">They get an e-mail with a link to choose their own password.</p>
      <form
        noValidate
        className="grid gap-4 sm:grid-cols-2"
        onSubmit={form.handleSubmit((values) => {
          setDone(null);
          invite.mutate(values);
        })}
      >
        <TextField label="Name" error={errors.name?.message} {...form.register("name")} autoComplete="off" />
        <TextField
          label="E-mail"
          type="email"
          error={errors.email?.message}
          {...form.register("email")}
          autoComplete="off"
        />
        <div>
          <label htmlFor="new-role" className="field-label">
            Role
          </label>
          <select id="new-role" className="field-input" {...form.register("role")}>
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>
        </div>
        {errors.root && (
          <p role="alert" className="field-error sm:col-span-2">
            {errors.root.message}
          </p>
        )}
        {done && (
          <p role="status" className="font-bold text-sound-700 sm:col-span-2">
            {done}
          </p>
        )}
        <div className="sm:col-span-2">
          <button type="submit" className="btn-primary" disabled={invite.isPending}>
            {invite.isPending ? "Sending…" : "Send invitation"}
          </button>
        </div>
      </form>
    </section>
  );
}
