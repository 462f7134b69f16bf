/** One verdict a senior gave on the case, with the time already said on the shop's clock. */
export interface ReviewEntry {
  verdict: string;
  reviewer: string;
  comment: string | null;
  when: string;
}

/** What the interview knows of the case's review: the verdicts so far and the conclusion sent before. */
export interface ReviewContext {
  thread: ReviewEntry[];
  earlierCause: string | null;
  earlierNotes: string | null;
}

/** The senior's latest comment on a sent-back case, where the apprentice works. */
export function SentBackNote({ review }: { review: ReviewContext }) {
  const last = review.thread.at(-1);
  if (!last || last.verdict !== "sent_back") return null;
  return (
    <section
      aria-label="Sent back by a senior"
      className="rounded-card border-2 border-l-8 border-caution-500 bg-caution-50 p-3 text-caution-700"
      data-testid="sent-back-note"
    >
      <p className="font-bold">
        Sent back by {last.reviewer}, {last.when}
      </p>
      {last.comment && <p className="mt-1 whitespace-pre-line text-ink">&ldquo;{last.comment}&rdquo;</p>}
    </section>
  );
}

/** Every verdict so far, oldest first: what a resubmission answers. */
export function ReviewThread({ review }: { review: ReviewContext }) {
  if (review.thread.length === 0) return null;
  return (
    <section aria-labelledby="review-thread-heading" className="space-y-2" data-testid="review-thread">
      <h3 id="review-thread-heading" className="font-bold">
        The review so far
      </h3>
      <ol className="space-y-2">
        {review.thread.map((entry, i) => (
          <li key={i} className="rounded-card border border-paper-line p-2">
            <p className="text-sm font-bold">
              {entry.verdict === "signed_off" ? "Signed off" : "Sent back"} by {entry.reviewer}, {entry.when}
            </p>
            {entry.comment && <p className="whitespace-pre-line">&ldquo;{entry.comment}&rdquo;</p>}
          </li>
        ))}
      </ol>
    </section>
  );
}
