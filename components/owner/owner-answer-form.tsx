"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { useMutation } from "@tanstack/react-query";
import { NOTE_MAX_CHARS, type OwnerAnswer } from "@/lib/contracts/owner-summary";
import { ApiError } from "@/lib/queries/api-fetch";
import { answerOwnerProposal } from "@/lib/queries/owner-summary";

/** The owner's yes or no, with an optional note. What was typed stays if the answer fails. */
export function OwnerAnswerForm({ token, proposalId }: { token: string; proposalId: number }) {
  const router = useRouter();
  const [note, setNote] = useState("");
  const [error, setError] = useState<string | null>(null);
  const answer = useMutation({
    mutationFn: (value: OwnerAnswer) => answerOwnerProposal(token, { proposalId, answer: value, note }),
    onSuccess: () => router.refresh(),
    onError: (e) =>
      setError(
        e instanceof ApiError
          ? (Object.values(e.fieldErrors ?? {})[0]?.[0] ?? e.message)
          : "We could not reach the shop. Your note is kept; try again.",
      ),
  });
  return (
    <form className="space-y-3 print:hidden" onSubmit={(e) => e.preventDefault()}>
      <div>
        <label htmlFor="owner-note" className="field-label">
          A note for the shop (optional)
        </label>
        <textarea
          id="owner-note"
          rows={3}
          maxLength={NOTE_MAX_CHARS}
          className="field-input py-2"
          value={note}
          onChange={(e) => setNote(e.target.value)}
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
          disabled={answer.isPending}
          onClick={() => {
            setError(null);
            answer.mutate("approved");
          }}
        >
          Approve the repair
        </button>
        <button
          type="button"
          className="btn-quiet"
          disabled={answer.isPending}
          onClick={() => {
            setError(null);
            answer.mutate("declined");
          }}
        >
          Decline
        </button>
      </div>
    </form>
  );
}
