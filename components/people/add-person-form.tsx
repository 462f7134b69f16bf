"use client";

import { useMutation, useQueryClient } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { useState } from "react";
import { createUserSchema, type CreateUserInput } from "@/lib/contracts/users";
import { ROLE_LABELS, ROLES } from "@/lib/auth/roles";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { userKeys } from "@/lib/queries/users";
import { TextField } from "@/components/ui/text-field";

export function AddPersonForm() {
  const queryClient = useQueryClient();
  const [done, setDone] = useState<string | null>(null);
  const form = useForm<CreateUserInput>({
    resolver: zodResolver(createUserSchema),
    defaultValues: { email: "", name: "", role: "technician", password: "" },
  });
  const create = useMutation({
    mutationFn: (body: CreateUserInput) => apiFetch("/api/users", { method: "POST", body }),
    onSuccess: (_data, body) => {
      setDone(`${body.name} can now sign in.`);
      form.reset({ email: "", name: "", role: body.role, password: "" });
      return queryClient.invalidateQueries({ queryKey: userKeys.all });
    },
    onError: (error) => {
      if (error instanceof ApiError) {
        for (const [field, messages] of Object.entries(error.fieldErrors ?? {})) {
          form.setError(field as keyof CreateUserInput, { message: messages[0] });
        }
        form.setError("root", { message: error.message });
      } else {
        form.setError("root", { message: "No answer from the server; your entries are kept. Try again." });
      }
    },
  });
  const { errors } = form.formState;

  return (
    <section aria-labelledby="add-person-heading" className="card">
      <h2 id="add-person-heading" className="mb-3 text-xl font-bold">
        Add a person
      </h2>
      <form
        noValidate
        className="grid gap-4 sm:grid-cols-2"
        onSubmit={form.handleSubmit((values) => {
          setDone(null);
          create.mutate(values);
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
        <TextField
          label="First password"
          type="password"
          autoComplete="new-password"
          hint="At least 12 characters; they can change it later."
          error={errors.password?.message}
          {...form.register("password")}
        />
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
          <button type="submit" className="btn-primary" disabled={create.isPending}>
            {create.isPending ? "Adding…" : "Add person"}
          </button>
        </div>
      </form>
    </section>
  );
}
