import type { ReactNode } from "react";
import type { CautionLevel } from "@/lib/cautions/catalog";

/** A caution already drawn (components/cautions/caution-cards.tsx), open and folded. */
export interface CautionCardItem {
  id: string;
  level: CautionLevel;
  open: ReactNode;
  folded: ReactNode;
}

/** What the folded line says: cautions already read in this case, or only the quieter notes. */
function foldSummary(earlier: number, notes: number): string {
  const plural = (n: number, one: string, many: string) => (n === 1 ? `1 ${one}` : `${n} ${many}`);
  if (earlier === 0) return `${plural(notes, "more note", "more notes")}`;
  const shown = `${plural(earlier, "caution", "cautions")} shown earlier in this case`;
  return notes === 0 ? shown : `${shown}, ${plural(notes, "note", "notes")}`;
}

/**
 * Which cautions show open and which fold. Dangers and warnings are open the first time they apply;
 * ones in `shownEarlier` (already shown open in this case) fold to one line with the notices, so the
 * step's first field stays in view. Nothing folds where every caution must show (the service record
 * lists them all, with sources). It draws nothing itself: the cards come drawn, so a client screen can
 * take them from the server.
 */
export function CautionsFold({
  cards,
  heading = "Cautions",
  showHeading = false,
  foldNotices = true,
  shownEarlier,
  foldMark,
}: {
  cards: readonly CautionCardItem[];
  heading?: string;
  showHeading?: boolean;
  foldNotices?: boolean;
  shownEarlier?: ReadonlySet<string>;
  foldMark: ReactNode;
}) {
  if (cards.length === 0) return null;
  const earlier = cards.filter((c) => shownEarlier?.has(c.id));
  const notes = foldNotices ? cards.filter((c) => c.level === "notice" && !earlier.includes(c)) : [];
  const folded = [...earlier, ...notes];
  const open = cards.filter((c) => !folded.includes(c));
  return (
    <section aria-label={heading} className="space-y-2">
      {showHeading && <h3 className="font-bold">{heading}</h3>}
      {open.length > 0 && (
        <ul className="space-y-2">
          {open.map((c) => (
            <li key={c.id}>{c.open}</li>
          ))}
        </ul>
      )}
      {folded.length > 0 && (
        <details className="rounded-card border border-paper-line bg-paper p-3" data-testid="folded-cautions">
          <summary className="min-h-touch cursor-pointer font-bold">
            {foldMark}
            {foldSummary(earlier.length, notes.length)}
          </summary>
          <ul className="mt-2 space-y-2">
            {folded.map((c) => (
              <li key={c.id}>{c.folded}</li>
            ))}
          </ul>
        </details>
      )}
    </section>
  );
}
