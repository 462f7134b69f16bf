import type { CauseId } from "./causes";
import type { DoNotRun, DoNotRunReason } from "./do-not-run";
import { REAL_SHARE } from "./grading";
import type { DiagnosisInput } from "./schema";

/** Why no running test: one plain sentence per reason. */
export const DO_NOT_RUN_REASON_TEXT: Record<DoNotRunReason, string> = {
  no_liquid: "the static pressure shows no liquid left",
  recovered_not_recharged: "the charge has been recovered and not put back",
  leak_with_short_charge: "a leak was found and the charge is short",
  electric_static_unknown: "the electric compressor's charge has not been shown by a static reading",
  electric_static_low: "the static pressure on an electric-compressor system is below saturation",
};

export function doNotRunReason(state: DoNotRun): string {
  const said = state.reasons.map((r) => DO_NOT_RUN_REASON_TEXT[r]);
  const list = said.length > 1 ? `${said.slice(0, -1).join(", ")} and ${said.at(-1)}` : (said[0] ?? "");
  return `Do not run the system: ${list}.`;
}

/** Causes whose repair is a part, not the charge: the path names the repair before the refill. */
const PART_REPAIRS: Partial<Record<CauseId, string>> = {
  metering_restriction: "replace the orifice tube or expansion valve (flush if there is debris)",
  high_side_restriction: "replace the restricted condenser, drier or line (flush if there is debris)",
  metering_stuck_open: "replace the expansion valve",
  weak_compressor: "repair or replace the compressor, with its oil measured and restored",
  moisture: "find where the moisture entered",
  non_condensables: "find where the air entered",
  oil_loss: "restore the oil to the maker's quantity and type",
};

/**
 * The repair path, in order, for a system that must not be run: identify, recover what is left, find and
 * repair the leak, replace the drier or accumulator if the system was opened, evacuate, hold, recharge by
 * weight, and only then the running test (common practice; Directive 2006/40/EC Art. 7 for repair before
 * refill; leak detection per SAE J2791/J2913, J2970).
 */
export function repairPath(
  input: DiagnosisInput,
  state: DoNotRun,
  leader: CauseId,
  ranking: readonly { cause: CauseId; share: number }[] = [],
): string {
  const symptoms = new Set(input.symptoms ?? []);
  const steps: string[] = [];
  const recovered = input.recoveredChargeG !== undefined;
  const hoseOn =
    recovered ||
    input.identifierPurityPct !== undefined ||
    input.staticKpaGauge !== undefined ||
    input.highKpaGauge !== undefined ||
    input.lowKpaGauge !== undefined;
  if (!hoseOn && !symptoms.has("sealant_found") && !symptoms.has("no_sealant_found"))
    steps.push("look for sealant at the service ports before any hose goes on");
  if (input.identifierPurityPct === undefined && !recovered)
    steps.push("identify the refrigerant (SAE J2912 type) before any machine is connected");
  if (!recovered) steps.push("recover whatever is left with certified equipment and weigh it");
  const leakSuspected =
    state.reasons.includes("no_liquid") ||
    state.reasons.includes("leak_with_short_charge") ||
    leader === "undercharge" ||
    symptoms.has("leak_found");
  if (symptoms.has("leak_found")) steps.push("repair the leak that was found");
  else if (leakSuspected)
    steps.push(
      "find the leak with dry nitrogen or an approved tracer gas (SAE J2970), as the maker's procedure allows, and repair it",
    );
  const part = PART_REPAIRS[leader];
  if (part) steps.push(part);
  const real = (cause: CauseId) =>
    cause === leader || (ranking.find((r) => r.cause === cause)?.share ?? 0) >= REAL_SHARE;
  if (
    (real("oil_loss") || real("weak_compressor")) &&
    !symptoms.has("oil_short_at_drain") &&
    !symptoms.has("oil_normal_at_drain")
  )
    steps.push("drain and measure the compressor's oil against the maker's quantity");
  steps.push(
    "replace the receiver-drier or accumulator if the system was opened or wet",
    "evacuate below water's boiling pressure and hold the vacuum",
    "recharge by weight to the label",
    input.compressorType === "electric"
      ? "only then run the test, in the vehicle's ready mode"
      : "only then run the test",
  );
  const text = steps.join("; ");
  return `${text.charAt(0).toUpperCase()}${text.slice(1)}.`;
}
