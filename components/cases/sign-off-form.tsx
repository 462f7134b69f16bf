"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation } from "@tanstack/react-query";
import { apiFetch, ApiError } from "@/lib/queries/api-fetch";

/** A senior's verdict on an apprentice's diagnosis, with the comment the apprentice will read. */
export function SignOffForm({ caseId }: { caseId: number }) {
  const router = useRouter();
  const [comment, setComment] = useState("");
  const [error, setError] = useState<string | null>(null);
  const verdict = useMutation({
    mutationFn: (body: { verdict: "signed_off" | "sent_back"; comment?: string }) =>
      apiFetch(`/api/cases/${caseId}/signoff`, { method: "POST", body }),
    onSuccess: () => router.refresh(),
    onError: (e) =>
      setError(
        e instanceof ApiError
          ? (Object.values(e.fieldErrors ?? {})[0]?.[0] ?? e.message)
          : "No answer from the server; your comment is kept. Try again.",
      ),
  });
  return (
    <section aria-labelledby="signoff-heading" className="card space-y-3">
      <h2 id="signoff-heading" className="text-lg font-bold">
        Your sign-off
      </h2>
      <p className="text-ink-soft">
        Check the readings and the findings against the apprentice&apos;s conclusion.
      </p>
      <div>
        <label htmlFor="signoff-comment" className="field-label">
          Comment for the apprentice
        </label>
        <textarea
          id="signoff-comment"
          rows={3}
          className="field-input py-2"
          value={comment}
          onChange={(e) => setComment(e.target.value)}
        />
      </div>
      {error && (
        <p role="alert" className="field-error">
          {error}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className="btn-primary"
          disabled={verdict.isPending}
          onClick={() => {
            setError(null);
            verdict.mutate({ verdict: "signed_off", comment: comment || undefined });
          }}
        >
          Sign off
        </button>
        <button
          type="button"
          className="btn-quiet"
          disabled={verdict.isPending}
          onClick={() => {
            setError(null);
            verdict.mutate({ verdict: "sent_back", comment });
          }}
        >
          Send back
        </button>
      </div>
    </section>
  );
}
