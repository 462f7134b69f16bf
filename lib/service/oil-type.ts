import type { CautionLevel } from "@/lib/cautions/catalog";
import { refrigerantInfo, type RefrigerantId } from "@/lib/refrigerants";
import { SERVICE_SOURCES } from "./sources";

export type OilFamily = "PAG" | "POE" | "mineral" | "PAO" | "unknown";
export type CompressorDrive = "belt" | "electric";

/** Classify free-text oil names ("PAG 46", "POE 80", "ester") into families. */
export function oilFamily(oilType: string): OilFamily {
  const t = oilType.toLowerCase();
  if (/\bpag(?![a-z])|polyalkylene/.test(t)) return "PAG";
  if (/\bpoe(?![a-z])|polyol|ester/.test(t)) return "POE";
  if (/\bpao(?![a-z])|polyalpha/.test(t)) return "PAO";
  if (/mineral/.test(t)) return "mineral";
  return "unknown";
}

export interface OilWarning {
  id: "pag_in_electric" | "unconfirmed_dielectric" | "differs_from_spec" | "mineral_with_hfc";
  /** on the cautions' scale (lib/cautions/catalog.ts): danger, or warning */
  level: Extract<CautionLevel, "danger" | "warning">;
  text: string;
  source: string;
}

/** Does the oil being added suit the compressor and the vehicle's spec? */
export function oilSuitsCompressor(input: {
  compressorDrive: CompressorDrive;
  oilAdded: string;
  specOilType?: string;
  refrigerant?: RefrigerantId;
}): { suits: boolean; warnings: OilWarning[] } {
  const added = oilFamily(input.oilAdded);
  const warnings: OilWarning[] = [];
  if (input.compressorDrive === "electric") {
    if (added === "PAG") {
      warnings.push({
        id: "pag_in_electric",
        level: "danger",
        text: "PAG oil in a high-voltage electric compressor can break down its insulation and leave the compressor case live. Use the dielectric oil (usually POE) the maker specifies, through equipment that does not inject oil.",
        source: SERVICE_SOURCES.dielectricOil,
      });
    } else if (added !== "POE") {
      warnings.push({
        id: "unconfirmed_dielectric",
        level: "warning",
        text: "Confirm this is the dielectric oil the maker specifies for the electric compressor before adding it.",
        source: SERVICE_SOURCES.dielectricOil,
      });
    }
  }
  if (
    input.specOilType &&
    oilFamily(input.specOilType) !== "unknown" &&
    oilFamily(input.specOilType) !== added
  ) {
    warnings.push({
      id: "differs_from_spec",
      level: "warning",
      text: `The oil added (${input.oilAdded}) is not the kind the spec calls for (${input.specOilType}).`,
      source: "vehicle spec",
    });
  }
  const chemistry = input.refrigerant && refrigerantInfo(input.refrigerant).chemistry;
  if (added === "mineral" && (chemistry === "HFC" || chemistry === "HFO")) {
    warnings.push({
      id: "mineral_with_hfc",
      level: "warning",
      text: `Mineral oil does not mix with ${input.refrigerant} and will not return to the compressor.`,
      source: "from memory — refrigerant/oil miscibility",
    });
  }
  return { suits: !warnings.some((w) => w.level === "danger" || w.id === "differs_from_spec"), warnings };
}
