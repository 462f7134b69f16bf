import { SaidInReaderUnits } from "@/components/shell/reader-units";
import { cautionCard, FOLD_MARK, type CautionItem } from "./caution-cards";
import { CautionsFold } from "./cautions-fold";

export type { CautionItem } from "./caution-cards";

/**
 * Safety and service cautions from the one catalogue, their quantities in the reader's units. Dangers
 * and warnings are open the first time they apply; ones in `shownEarlier` (already shown open in this
 * case) fold to one line with the notices, so the step's first field stays in view. Nothing folds where
 * every caution must show (the service record lists them all, with sources).
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
  return (
    <CautionsFold
      cards={cautions.map((c) => cautionCard(c, withSources, <SaidInReaderUnits text={c.text} />))}
      heading={heading}
      showHeading={showHeading}
      foldNotices={foldNotices}
      shownEarlier={shownEarlier}
      foldMark={FOLD_MARK}
    />
  );
}
