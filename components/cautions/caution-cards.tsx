import type { ReactNode } from "react";
import { clsx } from "clsx";
import { CAUTION_LEVEL_LABELS, type CautionLevel } from "@/lib/cautions/catalog";
import type { CautionCardItem } from "./cautions-fold";
import { DangerMark, NoticeMark, WarningMark } from "./level-marks";

// How a caution is drawn, open and folded. No hooks: a server page can render these once and hand
// them to a client screen as props, so neither the catalogue nor the marks travel in its script.

export interface CautionItem {
  id: string;
  level: CautionLevel;
  title?: string;
  text: string;
  source?: string;
}

/** Each level's own look: a tinted card with a heavy left edge, and a tag with its mark and its name. */
const LOOK: Record<CautionLevel, { card: string; tag: string; Mark: typeof NoticeMark }> = {
  danger: {
    card: "border-ember-500 bg-ember-50 text-ember-700",
    tag: "bg-ember-700 text-white",
    Mark: DangerMark,
  },
  warning: {
    card: "border-caution-500 bg-caution-50 text-caution-700",
    tag: "bg-caution-700 text-white",
    Mark: WarningMark,
  },
  notice: { card: "border-paper-line bg-paper text-ink", tag: "bg-ink-soft text-white", Mark: NoticeMark },
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

interface CardProps {
  caution: CautionItem;
  withSource: boolean;
  /** the caution's text as the reader reads it (its quantities in their units) */
  said: ReactNode;
}

function CautionCard({ caution, withSource, said }: CardProps) {
  return (
    <div className={clsx("rounded-card border-2 border-l-8 p-3", LOOK[caution.level].card)}>
      <LevelTag level={caution.level} />
      <p className="mt-1">
        {caution.title && <strong>{caution.title}. </strong>}
        {said}
      </p>
      {withSource && caution.source && <p className="mt-1 text-sm opacity-90">Source: {caution.source}</p>}
    </div>
  );
}

function FoldedItem({ caution, withSource, said }: CardProps) {
  return (
    <>
      {caution.level !== "notice" && <LevelTag level={caution.level} />}{" "}
      {caution.title && <strong>{caution.title}. </strong>}
      {said}
      {withSource && caution.source && (
        <span className="block text-sm text-ink-soft">Source: {caution.source}</span>
      )}
    </>
  );
}

/** One caution drawn both ways, open and folded, ready for CautionsFold. */
export function cautionCard(caution: CautionItem, withSource: boolean, said: ReactNode): CautionCardItem {
  return {
    id: caution.id,
    level: caution.level,
    open: <CautionCard caution={caution} withSource={withSource} said={said} />,
    folded: <FoldedItem caution={caution} withSource={withSource} said={said} />,
  };
}

/** The mark in front of the folded line. */
export const FOLD_MARK = <NoticeMark aria-hidden className="mr-1 inline h-5 w-5" />;
