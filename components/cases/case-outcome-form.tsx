"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation } from "@tanstack/react-query";
import { useForm, type UseFormRegister } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { caseOutcomeSchema, type CaseOutcomeInput } from "@/lib/contracts/case-outcome";
import { closeCase } from "@/lib/queries/case-outcome";
import { saveErrorOf } from "@/lib/queries/api-fetch";
import { CaseTextArea, FormFooter } from "./form-parts";

export interface OutcomeChoice {
  id: string;
  label: string;
}

/** A list to pick from: the likely ones in view, the rest folded under one line. */
export interface OutcomeChoices {
  shown: OutcomeChoice[];
  more: OutcomeChoice[];
}

function Choices({
  name,
  register,
  shown,
  more,
  moreLabel,
}: {
  name: "causes" | "repairIds";
  register: UseFormRegister<CaseOutcomeInput>;
  shown: OutcomeChoice[];
  more: OutcomeChoice[];
  moreLabel: string;
}) {
  const list = (choices: OutcomeChoice[]) => (
    <ul className="space-y-1">
      {choices.map((c) => (
        <li key={c.id}>
          <label className="flex min-h-touch items-center gap-2">
            <input type="checkbox" value={c.id} className="h-6 w-6 shrink-0" {...register(name)} />
            {c.label}
          </label>
        </li>
      ))}
    </ul>
  );
  return (
    <>
      {list(shown)}
      {more.length > 0 && (
        <details className="mt-1">
          <summary className="flex min-h-touch cursor-pointer items-center font-bold text-glacier-700">
            {moreLabel} ({more.length})
          </summary>
          {list(more)}
        </details>
      )}
    </>
  );
}

/**
 * Closing the case after the repair: the cause or causes the repair confirmed (the findings' list, the
 * case's leading causes first, or none found), the repairs done and a note. Nothing typed is lost when
 * the server refuses.
 */
export function CaseOutcomeForm({
  caseId,
  causes,
  repairs,
  defaults,
}: {
  caseId: number;
  causes: OutcomeChoices;
  repairs: OutcomeChoices;
  defaults: Pick<CaseOutcomeInput, "causes" | "repairIds">;
}) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<CaseOutcomeInput>({
    resolver: zodResolver(caseOutcomeSchema),
    defaultValues: { causes: defaults.causes, repairIds: defaults.repairIds, note: "" },
  });
  const close = useMutation({
    mutationFn: (body: CaseOutcomeInput) => closeCase(caseId, body),
    onSuccess: () => router.refresh(),
    onError: (error) => {
      const { fieldErrors, message } = saveErrorOf(error);
      for (const field of ["causes", "repairIds", "note"] as const)
        if (fieldErrors[field]) setError(field, { message: fieldErrors[field] });
      setFormError(message);
    },
  });
  const send = handleSubmit((values) => {
    setFormError(null);
    close.mutate({ ...values, note: values.note || undefined });
  });
  const causeError = errors.causes?.message ?? errors.causes?.root?.message;
  const repairError = errors.repairIds?.message ?? errors.repairIds?.root?.message;

  return (
    <form aria-labelledby="close-heading" className="card space-y-4" noValidate onSubmit={send}>
      <h2 id="close-heading" className="text-lg font-bold">
        Close the case
      </h2>
      <p className="text-ink-soft">After the repair: what it confirmed and what was done.</p>
      <fieldset aria-describedby={causeError ? "close-causes-error" : undefined}>
        <legend className="field-label">Confirmed cause</legend>
        <Choices
          name="causes"
          register={register}
          shown={causes.shown}
          more={causes.more}
          moreLabel="More causes"
        />
        {causeError && (
          <p id="close-causes-error" role="alert" className="field-error">
            {causeError}
          </p>
        )}
      </fieldset>
      <fieldset aria-describedby={repairError ? "close-repairs-error" : undefined}>
        <legend className="field-label">Repair done</legend>
        <Choices
          name="repairIds"
          register={register}
          shown={repairs.shown}
          more={repairs.more}
          moreLabel="More repairs"
        />
        {repairError && (
          <p id="close-repairs-error" role="alert" className="field-error">
            {repairError}
          </p>
        )}
      </fieldset>
      <CaseTextArea
        id="close-note"
        label="Note on the repair (optional)"
        error={errors.note?.message}
        registration={register("note")}
      />
      <FormFooter error={formError}>
        <button type="submit" className="btn-primary w-full" disabled={close.isPending}>
          Close the case
        </button>
      </FormFooter>
    </form>
  );
}
