"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation } from "@tanstack/react-query";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { caseReopenSchema, type CaseReopenInput } from "@/lib/contracts/case-outcome";
import { reopenCase } from "@/lib/queries/case-outcome";
import { saveErrorOf } from "@/lib/queries/api-fetch";
import { CaseTextArea, FormFooter } from "./form-parts";

/** A senior or the owner reopens a closed case; the reason is required and shows on the case. */
export function CaseReopenForm({ caseId }: { caseId: number }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<CaseReopenInput>({ resolver: zodResolver(caseReopenSchema), defaultValues: { reason: "" } });
  const reopen = useMutation({
    mutationFn: (body: CaseReopenInput) => reopenCase(caseId, body),
    onSuccess: () => router.refresh(),
    onError: (error) => {
      const { fieldErrors, message } = saveErrorOf(error);
      if (fieldErrors.reason) setError("reason", { message: fieldErrors.reason });
      setFormError(message);
    },
  });
  const send = handleSubmit((values) => {
    setFormError(null);
    reopen.mutate(values);
  });
  return (
    <form aria-labelledby="reopen-heading" className="card space-y-3" noValidate onSubmit={send}>
      <h2 id="reopen-heading" className="text-lg font-bold">
        Reopen the case
      </h2>
      <p className="text-ink-soft">
        The case goes back to signed off, and its confirmed cause and repairs are set aside until it is closed
        again.
      </p>
      <CaseTextArea
        id="reopen-reason"
        label="Reason for reopening"
        error={errors.reason?.message}
        registration={register("reason")}
      />
      <FormFooter error={formError}>
        <button type="submit" className="btn-quiet" disabled={reopen.isPending}>
          Reopen the case
        </button>
      </FormFooter>
    </form>
  );
}
