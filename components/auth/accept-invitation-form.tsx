"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import {
  PASSWORD_MIN_LENGTH,
  acceptInvitationFormSchema,
  type AcceptInvitationForm as FormValues,
} from "@/lib/contracts/invitations";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { TextField } from "@/components/ui/text-field";

export function AcceptInvitationForm({ token, name, email }: { token: string; name: string; email: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<FormValues>({
    resolver: zodResolver(acceptInvitationFormSchema),
    defaultValues: { token, name, password: "", passwordAgain: "" },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const body = { token: values.token, name: values.name, password: values.password };
    try {
      await apiFetch("/api/invitations/accept", { method: "POST", body });
      router.replace("/cases");
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError) {
        for (const [field, messages] of Object.entries(error.fieldErrors ?? {})) {
          if (field === "name" || field === "password") setError(field, { message: messages[0] });
        }
        setFormError(error.message);
      } else {
        setFormError("No answer from the server. Check the connection and try again; nothing is lost.");
      }
    }
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {/* Lets a password manager file the new password under the right address. */}
      <input type="email" autoComplete="username" value={email} readOnly hidden />
      <TextField label="Your name" autoComplete="name" error={errors.name?.message} {...register("name")} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
        error={errors.password?.message}
        {...register("password")}
      />
      <TextField
        label="New password again"
        type="password"
        autoComplete="new-password"
        error={errors.passwordAgain?.message}
        {...register("passwordAgain")}
      />
      {formError && (
        <p
          role="alert"
          className="rounded-card border-2 border-ember-500 bg-ember-50 p-3 font-bold text-ember-700"
        >
          {formError}
        </p>
      )}
      <button type="submit" className="btn-primary min-h-glove w-full text-lg" disabled={isSubmitting}>
        {isSubmitting ? "Setting up…" : "Set password and sign in"}
      </button>
    </form>
  );
}
