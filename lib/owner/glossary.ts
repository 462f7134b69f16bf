/**
 * The few trade words an owner's page cannot do without, each with a one-line explanation.
 * A term is listed on the page when its pattern occurs in the page's text.
 */
export interface GlossaryEntry {
  id: string;
  term: string;
  explanation: string;
  pattern: RegExp;
}

export const GLOSSARY: readonly GlossaryEntry[] = [
  {
    id: "refrigerant",
    term: "Refrigerant",
    explanation: "The gas in a sealed loop that carries heat out of the car.",
    pattern: /\brefrigerant\b/i,
  },
  {
    id: "compressor",
    term: "Compressor",
    explanation: "The pump that moves the refrigerant around the loop.",
    pattern: /\bcompressors?\b/i,
  },
  {
    id: "clutch",
    term: "Clutch",
    explanation: "The part that lets the engine's belt turn the compressor on and off.",
    pattern: /\bclutch\b/i,
  },
  {
    id: "condenser",
    term: "Condenser",
    explanation: "A thin radiator at the front of the car. It sheds the heat taken from the cabin.",
    pattern: /\bcondensers?\b/i,
  },
  {
    id: "evaporator",
    term: "Evaporator",
    explanation: "A small radiator behind the dash. It makes the air cold as the fan blows through it.",
    pattern: /\bevaporators?\b/i,
  },
  {
    id: "expansion_valve",
    term: "Expansion valve",
    explanation: "A small valve near the dash that lets just enough refrigerant into the evaporator.",
    pattern: /\bexpansion valves?\b/i,
  },
  {
    id: "orifice_tube",
    term: "Orifice tube",
    explanation: "A small tube with a fine screen that does the same job as an expansion valve.",
    pattern: /\borifice tubes?\b/i,
  },
  {
    id: "drier",
    term: "Drier",
    explanation: "A can in the loop filled with beads that soak up water. It wears out and is replaced.",
    pattern: /\bdriers?\b/i,
  },
  {
    id: "vacuum",
    term: "Vacuum",
    explanation: "Pumping a sealed system empty, so that no air or water is left in it.",
    pattern: /\bvacuum\b/i,
  },
  {
    id: "label",
    term: "Maker's label",
    explanation: "A sticker under the hood that says how much refrigerant the system takes.",
    pattern: /\blabel\b/i,
  },
  {
    id: "r1234yf",
    term: "R-1234yf",
    explanation:
      "The newer refrigerant in many cars. It can catch fire in some cases, so it needs certified tools.",
    pattern: /\bR-1234yf\b/,
  },
  {
    id: "r134a",
    term: "R-134a",
    explanation: "The refrigerant most cars used before R-1234yf.",
    pattern: /\bR-134a\b/,
  },
  {
    id: "r744",
    term: "R-744",
    explanation: "Carbon dioxide used as a refrigerant. It runs at very high pressure.",
    pattern: /\bR-744\b/,
  },
  {
    id: "cycling_switch",
    term: "Cycling switch",
    explanation: "A switch or sensor that stops the compressor before the evaporator freezes.",
    pattern: /\bcycling switch\b/i,
  },
  {
    id: "dye",
    term: "Leak dye",
    explanation: "A dye added to the loop that glows under a special lamp where it leaks out.",
    pattern: /\bdye\b/i,
  },
];

/** The glossary entries a text uses, in glossary order. */
export function termsUsedIn(text: string): GlossaryEntry[] {
  return GLOSSARY.filter((entry) => entry.pattern.test(text));
}
