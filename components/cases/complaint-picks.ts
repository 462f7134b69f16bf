// Complaints owners bring most often, in the plain words a technician would write down (our own
// list, common practice). A tap fills the complaint; the owner's own words can always replace it.
export const COMPLAINT_PICKS = [
  "Not as cold as it used to be",
  "Blows warm air",
  "Cold at first, then warm",
  "Cold when driving, warm at idle",
  "Noise when the A/C is on",
  "Smell from the vents",
] as const;

/** The complaint after a pick: the pick alone, or added to what is already written. */
export function withPick(current: string, pick: string): string {
  const text = current.trim();
  if (text === "") return pick;
  if (text.toLowerCase().includes(pick.toLowerCase())) return current;
  return `${text.replace(/[.;,]$/, "")}; ${pick.charAt(0).toLowerCase()}${pick.slice(1)}`;
}
