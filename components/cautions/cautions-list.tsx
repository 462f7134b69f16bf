import { clsx } from "clsx";
import { Info, OctagonAlert, TriangleAlert, type LucideIcon } from "lucide-react";
import { CAUTION_LEVEL_LABELS, type CautionLevel } from "@/lib/cautions/catalog";
import { SaidInReaderUnits } from "@/components/shell/reader-units";

export interface CautionItem {
  id: string;
  level: CautionLevel;
  title?: string;
  text: string;
  source?: string;
}

/** Each level's own look: a tinted card with a heavy left edge, and a tag with its mark and its name. */
const LOOK: Record<CautionLevel, { card: string; tag: string; Mark: LucideIcon }> = {
  danger: {
    card: "border-ember-500 bg-ember-50 text-ember-700",
    tag: "bg-ember-700 text-white",
    Mark: OctagonAlert,
  },
  warning: {
    card: "border-caution-500 bg-caution-50 text-caution-700",
    tag: "bg-caution-700 text-white",
    Mark: TriangleAlert,
  },
  notice: { card: "border-paper-line bg-paper text-ink", tag: "bg-ink-soft text-white", Mark: Info },
};

/** The level, said once: by the tag's shape, colour, mark and word, never as a prefix in the text. */
function LevelTag({ level }: { level: CautionLevel }) {
  const { tag, Mark } = LOOK[level];
  return (
    <span
      className={clsx(
        "inline-flex items-center gap-1 rounded-full px-2 py-0.5 text-xs font-bold uppercase tracking-wide",
        tag,
      )}
    >
      <Mark aria-hidden className="h-4 w-4" />
      {CAUTION_LEVEL_LABELS[level]}
    </span>
  );
}

function CautionCard({ caution, withSource }: { caution: CautionItem; withSource: boolean }) {
  return (
    <div className={clsx("rounded-card border-2 border-l-8 p-3", LOOK[caution.level].card)}>
      <LevelTag level={caution.level} />
      <p className="mt-1">
        {caution.title && <strong>{caution.title}. </strong>}
        <SaidInReaderUnits text={caution.text} />
      </p>
      {withSource && caution.source && <p className="mt-1 text-sm opacity-90">Source: {caution.source}</p>}
    </div>
  );
}

function FoldedItem({ caution, withSource }: { caution: CautionItem; withSource: boolean }) {
  return (
    <>
      {caution.level !== "notice" && <LevelTag level={caution.level} />}{" "}
      {caution.title && <strong>{caution.title}. </strong>}
      <SaidInReaderUnits text={caution.text} />
      {withSource && caution.source && (
        <span className="block text-sm text-ink-soft">Source: {caution.source}</span>
      )}
    </>
  );
}

/** What the folded line says: cautions already read in this case, or only the quieter notes. */
function foldSummary(earlier: number, notes: number): string {
  const plural = (n: number, one: string, many: string) => (n === 1 ? `1 ${one}` : `${n} ${many}`);
  if (earlier === 0) return `${plural(notes, "more note", "more notes")}`;
  const shown = `${plural(earlier, "caution", "cautions")} shown earlier in this case`;
  return notes === 0 ? shown : `${shown}, ${plural(notes, "note", "notes")}`;
}

/**
 * Safety and service cautions from the one catalogue. Dangers and warnings are open the first time
 * they apply; ones in `shownEarlier` (already shown open in this case) fold to one line with the
 * notices, so the step's first field stays in view. Nothing folds where every caution must show
 * (the service record lists them all, with sources).
 */
export function CautionsList({
  cautions,
  heading = "Cautions",
  showHeading = false,
  withSources = false,
  foldNotices = true,
  shownEarlier,
}: {
  cautions: readonly CautionItem[];
  heading?: string;
  showHeading?: boolean;
  withSources?: boolean;
  foldNotices?: boolean;
  shownEarlier?: ReadonlySet<string>;
}) {
  if (cautions.length === 0) return null;
  const earlier = cautions.filter((c) => shownEarlier?.has(c.id));
  const notes = foldNotices ? cautions.filter((c) => c.level === "notice" && !earlier.includes(c)) : [];
  const folded = [...earlier, ...notes];
  const open = cautions.filter((c) => !folded.includes(c));
  return (
    <section aria-label={heading} className="space-y-2">
      {showHeading && <h3 className="font-bold">{heading}</h3>}
      {open.length > 0 && (
        <ul className="space-y-2">
          {open.map((c) => (
            <li key={c.id}>
              <CautionCard caution={c} withSource={withSources} />
            </li>
          ))}
        </ul>
      )}
      {folded.length > 0 && (
        <details className="rounded-card border border-paper-line bg-paper p-3" data-testid="folded-cautions">
          <summary className="min-h-touch cursor-pointer font-bold">
            <Info aria-hidden className="mr-1 inline h-5 w-5" />
            {foldSummary(earlier.length, notes.length)}
          </summary>
          <ul className="mt-2 space-y-2">
            {folded.map((c) => (
              <li key={c.id}>
                <FoldedItem caution={c} withSource={withSources} />
              </li>
            ))}
          </ul>
        </details>
      )}
    </section>
  );
}
