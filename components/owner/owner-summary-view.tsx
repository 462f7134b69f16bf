import type { OwnerSummary, SharedPhoto } from "@/lib/contracts/owner-summary";
import { OwnerAnswerForm } from "./owner-answer-form";
import { PrintButton } from "./print-button";

function Section({ id, title, children }: { id: string; title: string; children: React.ReactNode }) {
  return (
    <section
      aria-labelledby={id}
      className="card space-y-2 break-inside-avoid print:border-0 print:p-0 print:shadow-none"
    >
      <h2 id={id} className="text-xl font-bold">
        {title}
      </h2>
      {children}
    </section>
  );
}

/** The owner's page: plain words, the few numbers that matter, and the shop's proposal. */
export function OwnerSummaryView({
  token,
  summary,
  photos,
}: {
  token: string;
  summary: OwnerSummary;
  photos: SharedPhoto[];
}) {
  const proposal = summary.proposal;
  return (
    <main
      id="main"
      className="mx-auto max-w-2xl space-y-4 px-3 py-5 text-lg print:max-w-none print:text-base"
    >
      <header className="space-y-1">
        <p className="font-bold text-glacier-700">{summary.shopName}</p>
        <h1 className="text-3xl font-bold">Your A/C: what we found</h1>
        {summary.vehicle && <p className="text-ink-soft">{summary.vehicle}</p>}
      </header>
      <p
        className="rounded-card border-l-8 border-glacier-600 bg-glacier-50 p-4 text-xl font-bold"
        data-testid="key-sentence"
      >
        {summary.keySentence}
      </p>

      <Section id="reported" title="What you told us">
        <blockquote className="border-l-4 border-paper-line pl-3 italic">{summary.reported}</blockquote>
      </Section>

      {summary.found && (
        <Section id="found" title={`What we found: ${summary.found.title}`}>
          <dl className="space-y-2">
            {summary.found.sections.map((s) => (
              <div key={s.heading}>
                <dt className="font-bold">{s.heading}</dt>
                <dd>{s.text}</dd>
              </div>
            ))}
          </dl>
        </Section>
      )}

      {summary.facts.length > 0 && (
        <Section id="facts" title="The numbers that matter">
          <ul className="space-y-2">
            {summary.facts.map((f) => (
              <li key={f.fact}>
                <span className="font-bold">{f.fact}</span> {f.meaning}
              </li>
            ))}
          </ul>
        </Section>
      )}

      {photos.length > 0 && (
        <Section id="photos" title="Photos from the work">
          <ul className="grid gap-3 sm:grid-cols-2 print:grid-cols-2">
            {photos.map((p) => (
              <li key={p.id}>
                <figure>
                  {/* eslint-disable-next-line @next/next/no-img-element -- served by our own route, already resized */}
                  <img
                    src={`/api/s/${token}/photos/${p.id}`}
                    alt={p.caption || "Photo from the work on your car"}
                    width={p.widthPx}
                    height={p.heightPx}
                    className="h-auto w-full rounded-card border border-paper-line"
                  />
                  {p.caption && <figcaption className="mt-1 text-base">{p.caption}</figcaption>}
                </figure>
              </li>
            ))}
          </ul>
        </Section>
      )}

      {summary.done.length > 0 && (
        <Section id="done" title="What we did">
          <ul className="space-y-2">
            {summary.done.map((r) => (
              <li key={r.id}>
                <span className="font-bold">{r.title}.</span> {r.involves}
              </li>
            ))}
          </ul>
        </Section>
      )}

      {proposal && (
        <Section id="proposal" title="What we propose">
          <ul className="space-y-2">
            {proposal.repairs.map((r) => (
              <li key={r.id}>
                <span className="font-bold">{r.title}.</span> {r.involves}
              </li>
            ))}
          </ul>
          {proposal.price && (
            <p>
              <span className="font-bold">Price:</span> {proposal.price}
            </p>
          )}
          {proposal.note && (
            <p>
              <span className="font-bold">Note from the shop:</span> {proposal.note}
            </p>
          )}
          {proposal.answer ? (
            <p role="status" className="rounded-card bg-sound-50 p-3 font-bold text-sound-700">
              You {proposal.answer.answer === "approved" ? "approved" : "declined"} this repair.
              {proposal.answer.note ? ` Your note: “${proposal.answer.note}”` : ""}
            </p>
          ) : (
            <OwnerAnswerForm token={token} proposalId={proposal.id} />
          )}
          <p className="text-base text-ink-soft">No payment is taken here.</p>
        </Section>
      )}

      {summary.nextCheck && (
        <Section id="next" title={`What we check next: ${summary.nextCheck.title}`}>
          <p>{summary.nextCheck.text}</p>
        </Section>
      )}

      {summary.watch.length > 0 && (
        <Section id="watch" title="What to watch for">
          <ul className="list-disc space-y-1 pl-6">
            {summary.watch.map((w) => (
              <li key={w}>{w}</li>
            ))}
          </ul>
        </Section>
      )}

      <Section id="safety" title="Safety">
        <ul className="list-disc space-y-1 pl-6">
          {summary.safety.map((s) => (
            <li key={s}>{s}</li>
          ))}
        </ul>
      </Section>

      {summary.glossary.length > 0 && (
        <Section id="words" title="Words we use">
          <dl className="space-y-1">
            {summary.glossary.map((g) => (
              <div key={g.term}>
                <dt className="inline font-bold">{g.term}: </dt>
                <dd className="inline">{g.explanation}</dd>
              </div>
            ))}
          </dl>
        </Section>
      )}

      <div className="flex flex-wrap gap-2 print:hidden">
        <PrintButton />
        <a href={`/api/s/${token}/pdf`} className="btn-quiet" download>
          Download as PDF
        </a>
      </div>
    </main>
  );
}
