import {
  SERVICE_RECORD_ENTRIES,
  type ServiceEntryField,
  type ServiceEntryKind,
  type ServiceRecordDto,
  type ServiceRecordInput,
  type ServiceStepId,
} from "@/lib/contracts/service-records";
import type { CaseFigures, FigureId } from "@/lib/contracts/case-figures";
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
  vacuumFieldText,
  type VacuumUnit,
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
  /** The reader's vacuum gauge; without one, inHg unless gauges read kPa. */
  vacuum?: VacuumUnit;
  /** How the reader writes numbers ("1,200" is 1200 in en-US, a question in de-DE). */
  locale?: string;
}

const vacuumUnitOf = (u: ShopUnitsPrefs): VacuumUnit => u.vacuum ?? (u.gauge === "kPa" ? "kPa" : "inHg");

/** The record's typed fields, by the API's names: the draft keeps what was typed in each. */
export type TextField = ServiceEntryField;
export const TEXT_FIELDS = Object.keys(SERVICE_RECORD_ENTRIES) as TextField[];

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
  defaults: { labelChargeG: number | null; oilType: string | null; figures?: Partial<CaseFigures> },
): Draft {
  const mass = (g: number) => withUnit(round(massFromG(g, u.mass), u.mass === "g" ? 0 : 2), u.mass);
  const vol = (ml: number) =>
    withUnit(round(volumeFromMl(ml, u.volume), u.volume === "mL" ? 0 : 1), u.volume);
  // In the reader's vacuum unit, to 0.001 so a re-save does not drift; a deep vacuum in microns, as typed.
  const vac = (k: number) => vacuumFieldText(k, vacuumUnitOf(u), { altitudeM: u.altitudeM });
  const shown: Record<ServiceEntryKind, (value: number | string) => string> = {
    mass: (v) => mass(Number(v)),
    volume: (v) => vol(Number(v)),
    vacuum: (v) => vac(Number(v)),
    gauge: (v) => withUnit(round(pressureFromKpa(Number(v), u.gauge), 1), u.gauge),
    temperature: (v) => withUnit(round(temperatureFromC(Number(v), u.temperature), 1), u.temperature),
    percent: (v) => String(v),
    minutes: (v) => String(v),
    instant: (v) => toLocalInput(String(v)),
    text: (v) => String(v),
  };
  // Before a record exists the label charge comes from the vehicle, the figures typed in the
  // interview from where they are kept (ServiceCaseContext.figures), and the oil from the spec.
  const figures = defaults.figures ?? {};
  const stored = (field: TextField) =>
    field === "labelChargeG" && !r
      ? defaults.labelChargeG
      : field === "oilAddedType"
        ? (r?.oilAddedType ?? defaults.oilType)
        : !r && field in figures
          ? figures[field as FigureId]
          : r?.[field];
  const text = {} as Record<TextField, string>;
  for (const field of TEXT_FIELDS) {
    const value = stored(field);
    text[field] = value == null || value === "" ? "" : shown[SERVICE_RECORD_ENTRIES[field]](value);
  }
  const parts: Draft["parts"] = {};
  for (const p of r?.partsReplaced ?? [])
    parts[p.part] = { count: p.count ?? 1, measured: p.measuredMl == null ? "" : vol(p.measuredMl) };
  return {
    text,
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

/** Every typed quantity in internal units, with a message for each one that cannot be read. */
export function readDraft(d: Draft, u: ShopUnitsPrefs): ReadDraft {
  const readers: Partial<Record<ServiceEntryKind, (t: string) => Entry>> = {
    mass: (t) => readMassG(t, u.mass, u.locale),
    volume: (t) => readVolumeMl(t, u.volume, u.locale),
    percent: (t) => readPlainNumber(t, "a percentage"),
    minutes: (t) => readPlainNumber(t, "minutes"),
    vacuum: (t) =>
      readVacuumKpaAbs(t, { altitudeM: u.altitudeM, defaultUnit: vacuumUnitOf(u), locale: u.locale }),
    temperature: (t) => readTemperatureC(t, u.temperature, u.locale),
    gauge: (t) => readGaugeKpa(t, u.gauge, u.locale),
  };
  const values: ReadDraft["values"] = {};
  const errors: ReadDraft["errors"] = {};
  for (const field of TEXT_FIELDS) {
    const read = readers[SERVICE_RECORD_ENTRIES[field]];
    if (!read) continue;
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
  const typed: Record<string, string | number | null> = {};
  for (const field of TEXT_FIELDS) {
    const kind = SERVICE_RECORD_ENTRIES[field];
    typed[field] =
      kind === "text"
        ? d.text[field].trim() || null
        : kind === "instant"
          ? iso(d.text[field])
          : (read.values[field] ?? null);
  }
  return {
    ...(typed as Pick<ServiceRecordInput, TextField>),
    baseVersion,
    step,
    specEntryId: d.specEntryId,
    recoveryCylinderId: d.recoveryCylinderId,
    chargeCylinderId: d.chargeCylinderId,
    oilPulled: d.oilPulled,
    partsReplaced: Object.entries(d.parts).map(([part, p]) => {
      const m = readVolumeMl(p?.measured ?? "", u.volume);
      return {
        part: part as ReplacedPartId,
        count: p?.count ?? 1,
        measuredMl: "value" in m ? m.value : null,
      };
    }),
  };
}
