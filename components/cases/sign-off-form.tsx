"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useForm } from "react-hook-form";
import { zodResolver } from "@hookform/resolvers/zod";
import { signOffSchema, type SignOffInput, type SignOffResponse } from "@/lib/contracts/cases";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";
import { CaseTextArea, FormFooter } from "./form-parts";

/** A senior's verdict on an apprentice's diagnosis, with the comment the apprentice will read. */
export function SignOffForm({ caseId }: { caseId: number }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    formState: { errors, isSubmitting },
  } = useForm<SignOffInput>({
    resolver: zodResolver(signOffSchema),
    defaultValues: { verdict: "signed_off", comment: "" },
  });

  const send = handleSubmit(async (values) => {
    setFormError(null);
    try {
      await apiFetch<SignOffResponse>(`/api/cases/${caseId}/signoff`, {
        method: "POST",
        body: { verdict: values.verdict, comment: values.comment || undefined },
      });
      router.refresh();
    } catch (error) {
      if (error instanceof ApiError) {
        const comment = error.fieldErrors?.comment?.[0];
        if (comment) setError("comment", { message: comment });
        else setFormError(error.message);
      } else setFormError("No answer from the server; your comment is kept. Try again.");
    }
  });
  // Each button submits the same form with its own verdict; the schema asks for a comment on a send-back.
  const submitWith = (verdict: SignOffInput["verdict"]) => () => {
    setValue("verdict", verdict);
    void send();
  };

  return (
    <form
      aria-labelledby="signoff-heading"
      className="card space-y-3"
      noValidate
      onSubmit={(e) => e.preventDefault()}
    >
      <h2 id="signoff-heading" className="text-lg font-bold">
        Your sign-off
      </h2>
      <p className="text-ink-soft">
        Check the readings and the findings against the apprentice&apos;s conclusion.
      </p>
      <input type="hidden" {...register("verdict")} />
      <CaseTextArea
        id="signoff-comment"
        label="Comment for the apprentice"
        error={errors.comment?.message}
        registration={register("comment")}
      />
      <FormFooter error={formError}>
        <div className="flex flex-wrap gap-2">
          <button
            type="button"
            className="btn-primary"
            disabled={isSubmitting}
            onClick={submitWith("signed_off")}
          >
            Sign off
          </button>
          <button
            type="button"
            className="btn-quiet"
            disabled={isSubmitting}
            onClick={submitWith("sent_back")}
          >
            Send back
          </button>
        </div>
      </FormFooter>
    </form>
  );
}
