import { describe, expect, it } from "vitest";
import fc from "fast-check";
import Papa from "papaparse";
import {
  searchWords,
  shopBooleanTerms,
  shopIndexTerms,
  shopQueryTerms,
  shopTermPrefix,
  wholeWordPattern,
} from "./words";
import { diagnose } from "@/lib/diagnosis";
import { caseFeaturesFrom, draftFeaturesFrom, featureDistance, FEATURE_KEYS } from "./features";
import { neighbourSummary, neighbourSummaryLine } from "./summary";
import { casebookCsv } from "./csv";
import { casebookSearchString, readCasebookParams, withParams } from "./url";
import type { CasebookRow } from "@/lib/contracts/casebook";

describe("search words", () => {
  it("splits like the full-text parser, drops stopwords beside other words and sets short words aside", () => {
    expect(searchWords("Warm at IDLE, A/C clicks; the R-134a fan")).toEqual({
      indexed: ["warm", "idle", "clicks", "134a", "fan"],
      short: ["c", "r"],
      stopwords: [],
    });
    expect(searchWords("at the")).toEqual({ indexed: [], short: [], stopwords: ["at", "the"] });
    expect(searchWords("  !! ")).toEqual({ indexed: [], short: [], stopwords: [] });
  });

  it("requires each short word and one of the others in a boolean search of the shop's terms", () => {
    expect(shopBooleanTerms({ indexed: ["light", "flashes"], short: ["ac"] }, 7)).toBe(
      "+qaaaahac +(qaaaahlight qaaaahflashes)",
    );
    expect(shopBooleanTerms({ indexed: [], short: ["ac", "r"] }, 7)).toBe("+qaaaahac +qaaaahr");
  });

  it("gives every shop its own letters-only prefix, so no two shops' terms can ever coincide", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 11_000_000 }),
        fc.integer({ min: 1, max: 11_000_000 }),
        (a, b) => {
          const pa = shopTermPrefix(a);
          expect(pa).toMatch(/^q[a-z]{5}$/);
          if (a !== b) expect(pa).not.toBe(shopTermPrefix(b));
        },
      ),
    );
    expect(shopIndexTerms("Warm at idle; warm again", 7)).toBe("qaaaahwarm qaaaahidle qaaaahagain");
    // Short words are terms too (the prefix makes them long enough for the index); stopwords are not.
    expect(shopIndexTerms("A/C off at idle", 7)).toBe("qaaaahc qaaaahoff qaaaahidle");
    expect(shopQueryTerms(["idle"], 7)).toBe("qaaaahidle");
  });

  it("matches a short word whole, never inside a longer one", () => {
    const re = new RegExp(wholeWordPattern("ac").replaceAll("[:alnum:]", "\\p{L}\\p{N}"), "iu");
    expect(re.test("AC light flashes")).toBe(true);
    expect(re.test("the ac.")).toBe(true);
    expect(re.test("vacuum would not hold")).toBe(false);
  });
});

describe("similar-case features", () => {
  it("reads the engine's computed values and the ambient from a findings snapshot", () => {
    const f = caseFeaturesFrom({
      computed: {
        condensingC: 55.123,
        evaporatingC: 1.2,
        subcoolingK: 6,
        superheatK: 9,
        condensingApproachK: 25,
        chargeDeltaPct: -12.34,
      },
      input: { ambientC: 30 },
    });
    expect(f).toEqual({
      condensingC: 55.12,
      evaporatingC: 1.2,
      subcoolingK: 6,
      superheatK: 9,
      approachK: 25,
      ambientC: 30,
      chargeDeviationPct: -12.3,
    });
    expect(caseFeaturesFrom(null).condensingC).toBeNull();
  });

  it("gives a draft the same readings the engine computes at submit, without the charge deviation", () => {
    const readings = {
      refrigerant: "R-134a",
      expansionDevice: "orifice_tube",
      ambientC: 32,
      highKpaGauge: 1450,
      lowKpaGauge: 240,
      liquidLineC: 48,
      suctionLineC: 9,
    } as const;
    const draft = draftFeaturesFrom(readings);
    const submitted = caseFeaturesFrom({ computed: diagnose(readings).computed, input: readings });
    expect(draft.condensingC).not.toBeNull();
    expect(draft.superheatK).not.toBeNull();
    expect(draft).toEqual({ ...submitted, chargeDeviationPct: null });
    expect(draftFeaturesFrom(null)).toEqual(caseFeaturesFrom(null));
    // An altitude outside the standard atmosphere is no reading at all, not an error.
    expect(draftFeaturesFrom({ ...readings, altitudeM: 1e6 }).condensingC).toBeNull();
  });

  it("measures distance in typical spreads, zero for the same readings, a penalty for a missing one", () => {
    const a = caseFeaturesFrom({ computed: { condensingC: 55, evaporatingC: 2 }, input: { ambientC: 30 } });
    expect(featureDistance(a, a)).toBe(0);
    const b = { ...a, condensingC: 61 }; // one spread (6 K) away on one of three readings
    expect(featureDistance(a, b)).toBeCloseTo(Math.sqrt(1 / 3), 6);
    const c = { ...a, evaporatingC: null };
    expect(featureDistance(a, c)).toBeCloseTo(Math.sqrt(1 / 3), 6);
    expect(FEATURE_KEYS).toHaveLength(7);
  });
});

describe("the neighbours' summary", () => {
  it("names the cause most neighbours share, in a sentence", () => {
    const n = (causes: string[]) => ({ confirmedCauses: causes as never });
    const summary = neighbourSummary([
      n(["condenser_airflow"]),
      n(["undercharge"]),
      ...Array.from({ length: 6 }, () => n(["condenser_airflow"])),
      n(["overcharge"]),
      n(["condenser_airflow"]),
    ]);
    expect(summary).toEqual({ cause: "condenser_airflow", count: 8, of: 10 });
    expect(neighbourSummaryLine({ cause: "condenser_airflow", count: 7, of: 10 })).toBe(
      "7 of the 10 nearest closed cases were confirmed as poor condenser airflow.",
    );
    expect(neighbourSummaryLine({ cause: "none_found", count: 1, of: 1 })).toBe(
      "The nearest closed case was confirmed as no fault found.",
    );
    expect(neighbourSummary([])).toBeNull();
  });
});

describe("the casebook CSV", () => {
  it("quotes what needs quoting and defuses formulas", () => {
    const row: CasebookRow = {
      caseId: 4,
      openedAt: "2026-05-01T10:00:00.000Z",
      closedAt: null,
      status: "closed",
      vehicle: "2018 Ford Transit",
      refrigerant: "R-134a",
      meteringDevice: "orifice_tube",
      complaint: '=HYPERLINK("x"), "warm", at idle',
      leadingSuspect: "condenser_airflow",
      confirmedCauses: ["condenser_airflow", "none_found"],
      technician: "Rowan",
      comebackOfCaseId: null,
      cameBackCaseId: 9,
    };
    const csv = casebookCsv([row], { header: true });
    const parsed = Papa.parse<string[]>(csv.trim()).data;
    expect(parsed[0]?.[0]).toBe("case");
    expect(parsed[1]?.[12]).toBe(`'=HYPERLINK("x"), "warm", at idle`);
    expect(parsed[1]?.[9]).toBe("Poor airflow through the condenser (fan, debris, blockage); No fault found");
    expect(casebookCsv([], { header: false })).toBe("");
    expect(casebookCsv([], { header: true })).toMatch(/^case,[^\r\n]*,complaint\r\n$/);
  });
});

describe("the casebook address", () => {
  it("keeps good filters, drops one it cannot read and says why", () => {
    const read = readCasebookParams({ q: "idle", refrigerant: "R-999", status: "closed", page: "2" });
    expect(read.params).toEqual({ q: "idle", status: "closed", page: "2" });
    expect(read.refused[0]?.key).toBe("refrigerant");
    expect(read.query.page).toBe(2);
    expect(casebookSearchString(read.params)).toBe("?q=idle&status=closed&page=2");
    expect(withParams(read.params, { status: "" })).toEqual({ q: "idle" });
    expect(withParams(read.params, { page: "3" })).toEqual({ q: "idle", status: "closed", page: "3" });
  });
});
