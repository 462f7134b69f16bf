import type { ServiceRecordDto, ServiceRecordInput, ServiceStepId } from "@/lib/contracts/service-records";
import type { ReplacedPartId } from "@/lib/service/oil";
import {
  type Entry,
  readGaugeKpa,
  readMassG,
  readPlainNumber,
  readTemperatureC,
  readVacuumKpaAbs,
  readVolumeMl,
} from "@/lib/service/entry";
import {
  type MassUnit,
  type PressureUnit,
  type TemperatureUnit,
  type VolumeUnit,
  kpaAbsToVacuumInHg,
  massFromG,
  pressureFromKpa,
  temperatureFromC,
  volumeFromMl,
} from "@/lib/units";

export interface ShopUnitsPrefs {
  mass: MassUnit;
  volume: VolumeUnit;
  gauge: PressureUnit;
  temperature: TemperatureUnit;
  altitudeM: number;
}

export const TEXT_FIELDS = [
  "labelCharge",
  "purity",
  "air",
  "recoveryStartedAt",
  "recoveryEndedAt",
  "recovered",
  "oilDrained",
  "slowRecoveryNote",
  "deepest",
  "holdStart",
  "holdEnd",
  "holdMinutes",
  "oilAddedType",
  "oilAdded",
  "target",
  "charged",
  "finalAmbient",
  "finalHigh",
  "finalLow",
  "finalVent",
  "notes",
] as const;
export type TextField = (typeof TEXT_FIELDS)[number];

export interface Draft {
  text: Record<TextField, string>;
  specEntryId: number | null;
  recoveryCylinderId: number | null;
  chargeCylinderId: number | null;
  oilPulled: boolean;
  parts: Partial<Record<ReplacedPartId, { count: number; measured: string }>>;
}

const round = (v: number, digits: number) => String(Math.round(v * 10 ** digits) / 10 ** digits);
const unitWord: Record<string, string> = { floz: "fl oz", C: "°C", F: "°F" };
const withUnit = (value: string, unit: string) => `${value} ${unitWord[unit] ?? unit}`;

/** datetime-local wants "YYYY-MM-DDTHH:mm" in the device's time zone. */
function toLocalInput(iso: string | null | undefined): string {
  if (!iso) return "";
  const d = new Date(iso);
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

export function draftFromRecord(
  r: ServiceRecordDto | null,
  u: ShopUnitsPrefs,
  defaults: { labelChargeG: number | null; oilType: string | null },
): Draft {
  const mass = (g: number | null | undefined) =>
    g == null ? "" : withUnit(round(massFromG(g, u.mass), u.mass === "g" ? 0 : 2), u.mass);
  const vol = (ml: number | null | undefined) =>
    ml == null ? "" : withUnit(round(volumeFromMl(ml, u.volume), u.volume === "mL" ? 0 : 1), u.volume);
  // Metric shops see the stored absolute pressure as it is; others see inHg of vacuum, to 0.001 so a re-save does not drift.
  const vac = (k: number | null | undefined) =>
    k == null
      ? ""
      : u.gauge === "kPa"
        ? `${round(k, 3)} kPa`
        : `${round(kpaAbsToVacuumInHg(k, { altitudeM: u.altitudeM }), 3)} inHg`;
  const gauge = (k: number | null | undefined) =>
    k == null ? "" : withUnit(round(pressureFromKpa(k, u.gauge), 1), u.gauge);
  const temp = (c: number | null | undefined) =>
    c == null ? "" : withUnit(round(temperatureFromC(c, u.temperature), 1), u.temperature);
  const plain = (n: number | null | undefined) => (n == null ? "" : String(n));
  const parts: Draft["parts"] = {};
  for (const p of r?.partsReplaced ?? [])
    parts[p.part] = { count: p.count ?? 1, measured: p.measuredMl == null ? "" : vol(p.measuredMl) };
  return {
    text: {
      labelCharge: mass(r ? r.labelChargeG : defaults.labelChargeG),
      purity: plain(r?.purityPct),
      air: plain(r?.airPct),
      recoveryStartedAt: toLocalInput(r?.recoveryStartedAt),
      recoveryEndedAt: toLocalInput(r?.recoveryEndedAt),
      recovered: mass(r?.recoveredG),
      oilDrained: vol(r?.oilDrainedMl),
      slowRecoveryNote: r?.slowRecoveryNote ?? "",
      deepest: vac(r?.deepestKpaAbs),
      holdStart: vac(r?.holdStartKpaAbs),
      holdEnd: vac(r?.holdEndKpaAbs),
      holdMinutes: plain(r?.holdMinutes),
      oilAddedType: r?.oilAddedType ?? defaults.oilType ?? "",
      oilAdded: vol(r?.oilAddedMl),
      target: mass(r?.targetG),
      charged: mass(r?.chargedG),
      finalAmbient: temp(r?.finalAmbientC),
      finalHigh: gauge(r?.finalHighKpaGauge),
      finalLow: gauge(r?.finalLowKpaGauge),
      finalVent: temp(r?.finalVentC),
      notes: r?.notes ?? "",
    },
    specEntryId: r?.specEntryId ?? null,
    recoveryCylinderId: r?.recoveryCylinderId ?? null,
    chargeCylinderId: r?.chargeCylinderId ?? null,
    oilPulled: r?.oilPulled ?? false,
    parts,
  };
}

export type ReadDraft = {
  values: Partial<Record<TextField, number | null>>;
  errors: Partial<Record<string, string>>;
};

/** Every typed field in internal units, with a message for each one that cannot be read. */
export function readDraft(d: Draft, u: ShopUnitsPrefs): ReadDraft {
  const readers: Partial<Record<TextField, (t: string) => Entry>> = {
    labelCharge: (t) => readMassG(t, u.mass),
    recovered: (t) => readMassG(t, u.mass),
    target: (t) => readMassG(t, u.mass),
    charged: (t) => readMassG(t, u.mass),
    oilDrained: (t) => readVolumeMl(t, u.volume),
    oilAdded: (t) => readVolumeMl(t, u.volume),
    purity: (t) => readPlainNumber(t, "a percentage"),
    air: (t) => readPlainNumber(t, "a percentage"),
    holdMinutes: (t) => readPlainNumber(t, "minutes"),
    deepest: (t) => readVacuumKpaAbs(t, { altitudeM: u.altitudeM }),
    holdStart: (t) => readVacuumKpaAbs(t, { altitudeM: u.altitudeM }),
    holdEnd: (t) => readVacuumKpaAbs(t, { altitudeM: u.altitudeM }),
    finalAmbient: (t) => readTemperatureC(t, u.temperature),
    finalVent: (t) => readTemperatureC(t, u.temperature),
    finalHigh: (t) => readGaugeKpa(t, u.gauge),
    finalLow: (t) => readGaugeKpa(t, u.gauge),
  };
  const values: ReadDraft["values"] = {};
  const errors: ReadDraft["errors"] = {};
  for (const [field, read] of Object.entries(readers) as [TextField, (t: string) => Entry][]) {
    const e = read(d.text[field]);
    if ("error" in e) errors[field] = e.error;
    else values[field] = "value" in e ? e.value : null;
  }
  for (const [part, p] of Object.entries(d.parts)) {
    const e = readVolumeMl(p?.measured ?? "", u.volume);
    if ("error" in e) errors[`part-${part}`] = e.error;
  }
  return { values, errors };
}

const iso = (local: string) => (local ? new Date(local).toISOString() : null);

export function inputFromDraft(
  d: Draft,
  read: ReadDraft,
  step: ServiceStepId,
  baseVersion: number,
  u: ShopUnitsPrefs,
): ServiceRecordInput {
  const v = read.values;
  return {
    baseVersion,
    step,
    specEntryId: d.specEntryId,
    labelChargeG: v.labelCharge ?? null,
    purityPct: v.purity ?? null,
    airPct: v.air ?? null,
    recoveryStartedAt: iso(d.text.recoveryStartedAt),
    recoveryEndedAt: iso(d.text.recoveryEndedAt),
    recoveredG: v.recovered ?? null,
    recoveryCylinderId: d.recoveryCylinderId,
    oilDrainedMl: v.oilDrained ?? null,
    oilPulled: d.oilPulled,
    slowRecoveryNote: d.text.slowRecoveryNote.trim() || null,
    deepestKpaAbs: v.deepest ?? null,
    holdStartKpaAbs: v.holdStart ?? null,
    holdEndKpaAbs: v.holdEnd ?? null,
    holdMinutes: v.holdMinutes ?? null,
    oilAddedType: d.text.oilAddedType.trim() || null,
    oilAddedMl: v.oilAdded ?? null,
    partsReplaced: Object.entries(d.parts).map(([part, p]) => {
      const m = readVolumeMl(p?.measured ?? "", u.volume);
      return {
        part: part as ReplacedPartId,
        count: p?.count ?? 1,
        measuredMl: "value" in m ? m.value : null,
      };
    }),
    targetG: v.target ?? null,
    chargedG: v.charged ?? null,
    chargeCylinderId: d.chargeCylinderId,
    finalAmbientC: v.finalAmbient ?? null,
    finalHighKpaGauge: v.finalHigh ?? null,
    finalLowKpaGauge: v.finalLow ?? null,
    finalVentC: v.finalVent ?? null,
    notes: d.text.notes.trim() || null,
  };
}
