import Link from "next/link";
import type { SignOffQueue } from "@/lib/contracts/work-counts";
import { queueSentence, waitedFor } from "@/lib/cases/waiting";

/** The senior's queue: how many wait and for how long, oldest first. */
export function SignOffQueueList({ queue, nowMs }: { queue: SignOffQueue; nowMs: number }) {
  const oldest = queue.items[0] ? Date.parse(queue.items[0].submittedAt) : null;
  return (
    <>
      <p className="mb-4 text-lg font-bold" data-testid="queue-summary">
        {queueSentence(queue.total, oldest, nowMs)}
      </p>
      {queue.items.length > 0 && (
        <ol className="space-y-3">
          {queue.items.map((c) => (
            <li key={c.id}>
              <Link href={`/cases/${c.id}`} className="card block hover:border-glacier-500">
                <div className="flex flex-wrap items-baseline justify-between gap-2">
                  <span className="font-bold">{c.vehicle ?? "Vehicle not recorded"}</span>
                  <span className="text-sm font-bold text-caution-700">
                    waiting {waitedFor(Date.parse(c.submittedAt), nowMs)}
                  </span>
                </div>
                <p className="mt-1 line-clamp-2 text-ink-soft">&ldquo;{c.complaint}&rdquo;</p>
                <p className="mt-1 text-sm text-ink-muted">
                  Case {c.id} · {c.technician}
                </p>
              </Link>
            </li>
          ))}
        </ol>
      )}
      {queue.total > queue.items.length && (
        <p className="mt-3 text-ink-soft">The {queue.items.length} oldest are shown; sign those off first.</p>
      )}
    </>
  );
}
