"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { PASSWORD_MIN_LENGTH } from "@/lib/contracts/invitations";
import {
  changePasswordFormSchema,
  passwordEmailProblem,
  type ChangePasswordForm as FormValues,
  type PasswordChangedResponse,
} from "@/lib/contracts/passwords";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { TextField } from "@/components/ui/text-field";

/** Current password, then the new one twice; on success the page reloads, since other devices were signed out. */
export function ChangePasswordForm({ email, temporary }: { email: string; temporary: boolean }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<FormValues>({
    resolver: zodResolver(changePasswordFormSchema),
    defaultValues: { currentPassword: "", newPassword: "", newPasswordAgain: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setDone(null);
    const emailProblem = passwordEmailProblem(values.newPassword, email);
    if (emailProblem) {
      setError("newPassword", { message: emailProblem });
      return;
    }
    try {
      const answer = await apiFetch<PasswordChangedResponse>("/api/me/password", {
        method: "PUT",
        body: { currentPassword: values.currentPassword, newPassword: values.newPassword },
      });
      reset();
      const others = answer.otherSessionsEnded;
      setDone(
        `Your password is changed.${others > 0 ? ` ${others === 1 ? "One other device was" : `${others} other devices were`} signed out.` : ""}`,
      );
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError) {
        for (const [field, messages] of Object.entries(error.fieldErrors ?? {}))
          if (field === "currentPassword" || field === "newPassword")
            setError(field, { message: messages[0] });
        setFormError(error.message);
      } else {
        setFormError("No answer from the server. Check the connection and try again; nothing was changed.");
      }
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-label="Change your password">
      {/* Lets a password manager file the new password under the right address. */}
      <input type="email" autoComplete="username" value={email} readOnly hidden />
      <TextField
        label={temporary ? "Temporary password from the shop owner" : "Current password"}
        type="password"
        autoComplete="current-password"
        error={errors.currentPassword?.message}
        {...register("currentPassword")}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters, not built from your e-mail address. A few unrelated words make a good one.`}
        error={errors.newPassword?.message}
        {...register("newPassword")}
      />
      <TextField
        label="New password again"
        type="password"
        autoComplete="new-password"
        error={errors.newPasswordAgain?.message}
        {...register("newPasswordAgain")}
      />
      {formError && (
        <p
          role="alert"
          className="rounded-card border-2 border-ember-500 bg-ember-50 p-3 font-bold text-ember-700"
        >
          {formError}
        </p>
      )}
      <p role="status" className="min-h-6 font-bold text-sound-700">
        {done}
      </p>
      <button type="submit" className="btn-primary min-h-glove w-full text-lg" disabled={isSubmitting}>
        {isSubmitting ? "Changing…" : "Change my password"}
      </button>
    </form>
  );
}
