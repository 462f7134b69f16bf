import { describe, expect, it } from "vitest";
import { CAUSE_IDS } from "./causes";
import { diagnose } from "./diagnose";
import type { DoNotRun } from "./do-not-run";
import { REAL_SHARE } from "./grading";
import { doNotRunReason, repairPath } from "./repair-path";
import type { DiagnosisInput } from "./schema";

// The repair path for a system that must not be run, in the trade's order (common practice; Directive
// 2006/40/EC Art. 7 repair before refill; SAE J2912 identification, J2970 tracer gas), and the ranking's
// own arithmetic: shares that sum to 1, evidence split by sign, ties in the causes' fixed order.
const base = { refrigerant: "R-134a", expansionDevice: "orifice_tube", ambientC: 25 } as const;
const state = (...reasons: DoNotRun["reasons"]): DoNotRun => ({ active: reasons.length > 0, reasons });

describe("why the system must not run", () => {
  it("joins one reason, two, or three into one sentence", () => {
    expect(doNotRunReason(state("no_liquid"))).toBe(
      "Do not run the system: the static pressure shows no liquid left.",
    );
    expect(doNotRunReason(state("no_liquid", "recovered_not_recharged"))).toBe(
      "Do not run the system: the static pressure shows no liquid left and the charge has been recovered and not put back.",
    );
    expect(doNotRunReason(state("no_liquid", "recovered_not_recharged", "leak_with_short_charge"))).toBe(
      "Do not run the system: the static pressure shows no liquid left, the charge has been recovered and not put back and a leak was found and the charge is short.",
    );
    expect(doNotRunReason(state())).toBe("Do not run the system: .");
  });
});

describe("the repair path, in order", () => {
  it("starts from nothing: sealant, identify, recover, find the leak, then drier, vacuum, weight, test", () => {
    expect(repairPath(base, state("no_liquid"), "undercharge")).toBe(
      "Look for sealant at the service ports before any hose goes on; identify the refrigerant (SAE J2912 type) before any machine is connected; recover whatever is left with certified equipment and weigh it; find the leak with dry nitrogen or an approved tracer gas (SAE J2970), as the maker's procedure allows, and repair it; replace the receiver-drier or accumulator if the system was opened or wet; evacuate below water's boiling pressure and hold the vacuum; recharge by weight to the label; only then run the test.",
    );
  });

  it("skips what is done: no sealant look once a hose was on or sealant was answered, no identify once identified", () => {
    for (const done of [
      { recoveredChargeG: 100 },
      { identifierPurityPct: 99 },
      { staticKpaGauge: 0 },
      { highKpaGauge: 900 },
      { lowKpaGauge: 100 },
      { symptoms: ["sealant_found" as const] },
      { symptoms: ["no_sealant_found" as const] },
    ])
      expect(repairPath({ ...base, ...done }, state("no_liquid"), "undercharge")).not.toMatch(
        /look for sealant/i,
      );
    expect(repairPath({ ...base, identifierPurityPct: 99 }, state("no_liquid"), "undercharge")).toMatch(
      /^Recover whatever is left/,
    );
    const recovered = repairPath(
      { ...base, recoveredChargeG: 100 },
      state("recovered_not_recharged"),
      "overcharge",
    );
    expect(recovered).not.toMatch(/identify the refrigerant|recover whatever/i);
    expect(recovered).toMatch(/^Replace the receiver-drier/);
  });

  it("repairs a found leak, and looks for one when the charge is gone, short, or the leader is a leak", () => {
    const withIdentity = { ...base, identifierPurityPct: 99 } as const;
    expect(
      repairPath(
        { ...withIdentity, symptoms: ["leak_found"] },
        state("recovered_not_recharged"),
        "overcharge",
      ),
    ).toMatch(/repair the leak that was found/);
    for (const [reasons, leader] of [
      [["no_liquid"], "overcharge"],
      [["leak_with_short_charge"], "overcharge"],
      [["recovered_not_recharged"], "undercharge"],
    ] as const)
      expect(repairPath(withIdentity, state(...reasons), leader)).toMatch(/find the leak with dry nitrogen/);
    expect(repairPath(withIdentity, state("recovered_not_recharged"), "overcharge")).not.toMatch(/leak/);
  });

  it("names the part to repair for the leader, and the oil when the compressor or the oil is in question", () => {
    const withIdentity = { ...base, identifierPurityPct: 99 } as const;
    expect(repairPath(withIdentity, state("recovered_not_recharged"), "metering_restriction")).toMatch(
      /; replace the orifice tube or expansion valve \(flush if there is debris\);/,
    );
    const compressor = repairPath(withIdentity, state("recovered_not_recharged"), "weak_compressor");
    expect(compressor).toMatch(/repair or replace the compressor.*; drain and measure the compressor's oil/);
    expect(
      repairPath(
        { ...withIdentity, symptoms: ["oil_normal_at_drain"] },
        state("recovered_not_recharged"),
        "weak_compressor",
      ),
    ).not.toMatch(/drain and measure/);
    expect(
      repairPath(
        { ...withIdentity, symptoms: ["oil_short_at_drain"] },
        state("recovered_not_recharged"),
        "oil_loss",
      ),
    ).not.toMatch(/drain and measure/);
    // Oil loss holding a real share behind another leader still has the oil measured; a small share does not.
    const ranked = (share: number) => [
      { cause: "overcharge" as const, share: 1 - share },
      { cause: "oil_loss" as const, share },
    ];
    expect(
      repairPath(withIdentity, state("recovered_not_recharged"), "overcharge", ranked(REAL_SHARE)),
    ).toMatch(/drain and measure/);
    expect(
      repairPath(withIdentity, state("recovered_not_recharged"), "overcharge", ranked(REAL_SHARE - 0.01)),
    ).not.toMatch(/drain and measure/);
  });

  it("runs an electric compressor's test in ready mode, and only after the recharge", () => {
    expect(repairPath({ ...base, compressorType: "electric" }, state("no_liquid"), "undercharge")).toMatch(
      /recharge by weight to the label; only then run the test, in the vehicle's ready mode\.$/,
    );
  });
});

describe("the ranking", () => {
  const overcharged: DiagnosisInput = {
    ...base,
    ambientC: 30,
    highKpaGauge: 1900,
    lowKpaGauge: 330,
    labelChargeG: 600,
  };

  it("gives every cause a share, the shares summing to 1, highest first, and the gap of the top two to the next check", () => {
    const findings = diagnose(overcharged);
    expect(findings.suspects.map((s) => s.cause).sort()).toEqual([...CAUSE_IDS].sort());
    expect(findings.suspects.reduce((sum, s) => sum + s.share, 0)).toBeCloseTo(1, 12);
    for (let i = 1; i < findings.suspects.length; i++) {
      expect(findings.suspects[i - 1]!.logOdds).toBeGreaterThanOrEqual(findings.suspects[i]!.logOdds);
      expect(findings.suspects[i - 1]!.share).toBeGreaterThanOrEqual(findings.suspects[i]!.share);
    }
    const [first, second] = findings.suspects;
    expect(first!.share / second!.share).toBeCloseTo(Math.exp(first!.logOdds - second!.logOdds), 9);
    expect(findings.suspects.every((s) => s.assessed)).toBe(true);
  });

  it("orders causes with equal log-odds by the causes' fixed order", () => {
    // With nothing measured but the device, several causes keep equal scores.
    const findings = diagnose(base);
    let ties = 0;
    for (let i = 1; i < findings.suspects.length; i++) {
      const a = findings.suspects[i - 1]!;
      const b = findings.suspects[i]!;
      if (a.logOdds !== b.logOdds) continue;
      ties++;
      expect(CAUSE_IDS.indexOf(a.cause)).toBeLessThan(CAUSE_IDS.indexOf(b.cause));
    }
    expect(ties).toBeGreaterThan(0);
  });

  it("splits each suspect's evidence by sign, strongest first", () => {
    for (const suspect of diagnose(overcharged).suspects) {
      const weights = suspect.evidence.map((e) => Math.abs(e.weight));
      expect(weights).toEqual([...weights].sort((a, b) => b - a));
      expect(suspect.evidenceFor).toHaveLength(suspect.evidence.filter((e) => e.weight > 0).length);
      expect(suspect.evidenceAgainst).toHaveLength(suspect.evidence.filter((e) => e.weight < 0).length);
      expect(suspect.evidenceFor).toEqual(suspect.evidence.filter((e) => e.weight > 0).map((e) => e.message));
    }
  });

  it("gives a failed identification the whole share and marks the rest not assessed", () => {
    for (const input of [
      { ...overcharged, identifierPurityPct: 90 },
      { ...overcharged, symptoms: ["identifier_flags_hydrocarbon" as const] },
    ]) {
      const findings = diagnose(input);
      for (const s of findings.suspects) {
        const contaminated = s.cause === "contaminated_refrigerant";
        expect(s.share).toBe(contaminated ? 1 : 0);
        expect(s.assessed).toBe(contaminated);
      }
      expect(findings.nextCheck.separates).toEqual(["contaminated_refrigerant"]);
      expect(findings.measured).toEqual(diagnose(input).measured);
    }
  });
});
