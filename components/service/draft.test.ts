import { describe, expect, it } from "vitest";
import type { ServiceRecordDto } from "@/lib/contracts/service-records";
import { draftFromRecord, inputFromDraft, readDraft, type ShopUnitsPrefs } from "./draft";

const metric: ShopUnitsPrefs = { mass: "g", volume: "mL", gauge: "kPa", temperature: "C", altitudeM: 12 };
const imperial: ShopUnitsPrefs = {
  mass: "oz",
  volume: "floz",
  gauge: "psi",
  temperature: "F",
  altitudeM: 1500,
};

const saved: ServiceRecordDto = {
  id: 1,
  version: 3,
  step: "recharge",
  technicianId: "t",
  technician: "T",
  refrigerant: "R-134a",
  holdPassed: true,
  finalReadingSetId: null,
  updatedAt: "2026-12-01T10:00:00.000Z",
  specEntryId: 4,
  labelChargeG: 570,
  purityPct: 99.4,
  airPct: 0.3,
  recoveryStartedAt: "2026-12-01T09:00:00.000Z",
  recoveryEndedAt: "2026-12-01T09:22:00.000Z",
  recoveredChargeG: 430,
  recoveryCylinderId: 7,
  oilRemovedMl: 12,
  oilPulled: false,
  slowRecoveryNote: null,
  deepestKpaAbs: 0.35,
  holdStartKpaAbs: 0.4,
  holdEndKpaAbs: 1.6,
  holdMinutes: 10,
  oilAddedType: "PAG 46",
  oilAddedMl: 42,
  partsReplaced: [{ part: "condenser", count: 1, measuredMl: null }],
  targetG: 570,
  chargedG: 572,
  chargeCylinderId: 8,
  finalAmbientC: 24,
  finalHighKpaGauge: 1180,
  finalLowKpaGauge: 200,
  finalVentC: 5.5,
  notes: null,
};

describe("service record draft", () => {
  for (const [name, units, tolerance] of [
    ["metric", metric, { g: 0, ml: 0, kpa: 0 }],
    ["US customary at 1500 m", imperial, { g: 1, ml: 1, kpa: 0.002 }],
  ] as const) {
    it(`round-trips a saved record through what the screen shows (${name}; conversions per NIST SP 811)`, () => {
      const draft = draftFromRecord(saved, units, { labelChargeG: null, oilType: null });
      const read = readDraft(draft, units);
      expect(read.errors).toEqual({});
      const input = inputFromDraft(draft, read, "final", saved.version, units);
      expect(Math.abs((input.recoveredChargeG ?? 0) - 430)).toBeLessThanOrEqual(tolerance.g);
      expect(Math.abs((input.chargedG ?? 0) - 572)).toBeLessThanOrEqual(tolerance.g);
      expect(Math.abs((input.oilAddedMl ?? 0) - 42)).toBeLessThanOrEqual(tolerance.ml);
      expect(Math.abs((input.holdEndKpaAbs ?? 0) - 1.6)).toBeLessThanOrEqual(tolerance.kpa + 1e-9);
      expect(Math.abs((input.finalHighKpaGauge ?? 0) - 1180)).toBeLessThanOrEqual(1);
      expect(input.finalVentC).toBeCloseTo(5.5, 1);
      expect(input.recoveryEndedAt).toBe("2026-12-01T09:22:00.000Z");
      expect(input.partsReplaced).toEqual([{ part: "condenser", count: 1, measuredMl: null }]);
      expect(input).toMatchObject({
        baseVersion: 3,
        step: "final",
        recoveryCylinderId: 7,
        chargeCylinderId: 8,
        specEntryId: 4,
      });
    });
  }

  it("starts a record not yet saved from the figures typed in the interview, in the reader's units", () => {
    const figures = { recoveredChargeG: 431, oilRemovedMl: 25, purityPct: 98.5, airPct: 1.2, chargedG: 600 };
    const draft = draftFromRecord(null, metric, { labelChargeG: 620, oilType: null, figures });
    expect(draft.text.labelChargeG).toBe("620 g");
    expect(draft.text.recoveredChargeG).toBe("431 g");
    expect(draft.text.oilRemovedMl).toBe("25 mL");
    expect(draft.text.purityPct).toBe("98.5");
    expect(draft.text.chargedG).toBe("600 g");
    // A saved record is shown as saved: the figures then live on it.
    const started = draftFromRecord({ ...saved, recoveredChargeG: 450 }, metric, {
      labelChargeG: 620,
      oilType: null,
      figures,
    });
    expect(started.text.recoveredChargeG).toBe("450 g");
  });

  it("keeps what was typed and reports an unreadable entry instead of sending it", () => {
    const draft = draftFromRecord(null, metric, { labelChargeG: 480, oilType: "PAG 46" });
    expect(draft.text.labelChargeG).toBe("480 g");
    draft.text.recoveredChargeG = "about a pound";
    const read = readDraft(draft, metric);
    expect(read.errors.recoveredChargeG).toMatch(/Could not read/);
    expect(draft.text.recoveredChargeG).toBe("about a pound");
  });

  it("reads 1,200 g as 1200 g, and asks where a decimal comma makes it ambiguous (common practice)", () => {
    const draft = draftFromRecord(null, metric, { labelChargeG: null, oilType: null });
    draft.text.recoveredChargeG = "1,200";
    expect(readDraft(draft, { ...metric, locale: "en-US" }).values.recoveredChargeG).toBe(1200);
    expect(readDraft(draft, { ...metric, locale: "de-DE" }).errors.recoveredChargeG).toMatch(
      /Did you mean 1,2 or 1\.200\?/,
    );
  });

  it("takes 29.9 inHg and 500 microns and shows them back as typed (NIST SP 811; US Standard Atmosphere 1976)", () => {
    const sea = { ...imperial, altitudeM: 0 };
    const draft = draftFromRecord(null, sea, { labelChargeG: null, oilType: null });
    draft.text.deepestKpaAbs = "500 microns";
    draft.text.holdStartKpaAbs = "29.9 inHg";
    draft.text.holdEndKpaAbs = "24 inHg";
    const read = readDraft(draft, sea);
    expect(read.errors).toEqual({});
    const input = inputFromDraft(draft, read, "evacuation", 0, sea);
    const again = draftFromRecord({ ...saved, ...input } as ServiceRecordDto, sea, {
      labelChargeG: null,
      oilType: null,
    });
    expect(again.text.deepestKpaAbs).toBe("500 microns");
    expect(again.text.holdStartKpaAbs).toBe("29.9 inHg");
    expect(again.text.holdEndKpaAbs).toBe("24 inHg");
  });

  it("refuses a vacuum deeper than the local atmosphere allows, with the reason", () => {
    const high = { ...imperial, altitudeM: 1500 };
    const draft = draftFromRecord(null, high, { labelChargeG: null, oilType: null });
    draft.text.deepestKpaAbs = "29.9 inHg";
    expect(readDraft(draft, high).errors.deepestKpaAbs).toMatch(/deeper vacuum than the air here allows/);
  });
});
