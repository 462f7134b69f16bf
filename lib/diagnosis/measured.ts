import { KEY_READING_GROUPS, type ReadingGroup } from "./observations";

/** Plain names of the key readings, for the statement of what was measured. */
export const READING_GROUP_LABELS: Record<ReadingGroup, string> = {
  high_side: "high side",
  low_side: "low side",
  lift: "compressor lift",
  subcooling: "subcooling",
  superheat: "superheat",
  static: "static pressure",
  charge: "recovered charge",
  purity: "identifier purity",
  air: "identifier air",
  vent: "centre vent",
  device: "metering device",
  cycling: "low side at cut-out and cut-in",
  pattern: "pressure pattern",
};

export interface Measured {
  /** Key readings measured and usable. */
  groups: ReadingGroup[];
  /** Key readings still to take. */
  missing: ReadingGroup[];
  /** One plain sentence for the screen: how much of the case rests on measurements. */
  statement: string;
}

function list(groups: readonly ReadingGroup[]): string {
  const names = groups.map((g) => READING_GROUP_LABELS[g]);
  return names.length > 1 ? `${names.slice(0, -1).join(", ")} and ${names.at(-1)}` : (names[0] ?? "");
}

/** How much of the case was measured: the key readings taken and those still missing. */
export function measuredStatement(
  observed: ReadonlySet<ReadingGroup>,
  refrigerantContaminated: boolean,
): Measured {
  const groups = KEY_READING_GROUPS.filter((g) => observed.has(g));
  const missing = KEY_READING_GROUPS.filter((g) => !observed.has(g));
  const count = `${groups.length} of the ${KEY_READING_GROUPS.length} key readings`;
  let statement =
    groups.length === 0
      ? `None of the ${KEY_READING_GROUPS.length} key readings has been measured yet: the ranking rests on the reported behaviour and on how common each cause is.`
      : missing.length === 0
        ? `All ${KEY_READING_GROUPS.length} key readings were measured.`
        : `Measured ${count} (${list(groups)}); not yet measured: ${list(missing)}.`;
  if (refrigerantContaminated)
    statement +=
      " The refrigerant failed identification, so its pressures and temperatures were not assessed.";
  return { groups, missing, statement };
}
