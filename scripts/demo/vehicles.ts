import type { ServiceRefrigerantId } from "@/lib/refrigerants/catalog";
import type { ExpansionDevice } from "@/lib/vehicles/expansion-devices";
import type { CompressorType } from "@/lib/vehicles/compressor-types";

// Real makes and models with invented VINs left empty. Label charges and oils here are
// illustrative demo values, not a reference: the shop's spec table and the under-hood label decide.

export type DemoVehicle = {
  key: string;
  customerKey: string;
  year: number;
  make: string;
  model: string;
  engine: string | null;
  refrigerant: ServiceRefrigerantId;
  expansionDevice: ExpansionDevice;
  electricCompressor: boolean;
  compressorType: CompressorType;
  labelChargeG: number | null;
  oilType: string | null;
};

export const demoVehicles: DemoVehicle[] = [
  {
    key: "focus",
    customerKey: "halvorsen",
    year: 2014,
    make: "Ford",
    model: "Focus",
    engine: "2.0 L I4",
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    electricCompressor: false,
    compressorType: "cycling_clutch",
    labelChargeG: 570,
    oilType: "PAG 46",
  },
  {
    key: "crv",
    customerKey: "mbeki",
    year: 2019,
    make: "Honda",
    model: "CR-V",
    engine: "1.5 L turbo I4",
    refrigerant: "R-1234yf",
    expansionDevice: "txv",
    electricCompressor: false,
    compressorType: "variable_displacement",
    labelChargeG: 450,
    oilType: "PAG 46",
  },
  {
    key: "silverado",
    customerKey: "tidewater",
    year: 2016,
    make: "Chevrolet",
    model: "Silverado 1500 (front and rear A/C)",
    engine: "5.3 L V8",
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    electricCompressor: false,
    compressorType: "cycling_clutch",
    labelChargeG: 1130,
    oilType: "PAG 150",
  },
  {
    key: "rav4",
    customerKey: "castellanos",
    year: 2021,
    make: "Toyota",
    model: "RAV4 Hybrid",
    engine: "2.5 L I4 hybrid",
    refrigerant: "R-1234yf",
    expansionDevice: "txv",
    electricCompressor: true,
    compressorType: "electric",
    labelChargeG: 480,
    oilType: "POE (dielectric)",
  },
  {
    key: "ranger",
    customerKey: "brandvold",
    year: 2010,
    make: "Ford",
    model: "Ranger",
    engine: "4.0 L V6",
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    electricCompressor: false,
    compressorType: "cycling_clutch",
    labelChargeG: 630,
    oilType: "PAG 46",
  },
  {
    key: "cx5",
    customerKey: "okafor",
    year: 2017,
    make: "Mazda",
    model: "CX-5",
    engine: "2.5 L I4",
    refrigerant: "R-134a",
    expansionDevice: "txv",
    electricCompressor: false,
    compressorType: "variable_displacement",
    labelChargeG: 450,
    oilType: "PAG 46",
  },
  // For the casebook: two more fleet vehicles, a second car, and a second Ridgeback vehicle.
  {
    key: "transit",
    customerKey: "tidewater",
    year: 2018,
    make: "Ford",
    model: "Transit",
    engine: "3.7 L V6",
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    electricCompressor: false,
    compressorType: "cycling_clutch",
    labelChargeG: 910,
    oilType: "PAG 46",
  },
  {
    key: "sierra",
    customerKey: "tidewater",
    year: 2016,
    make: "GMC",
    model: "Sierra 1500",
    engine: "5.3 L V8",
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    electricCompressor: false,
    compressorType: "cycling_clutch",
    labelChargeG: 740,
    oilType: "PAG 150",
  },
  {
    key: "malibu",
    customerKey: "castellanos",
    year: 2013,
    make: "Chevrolet",
    model: "Malibu",
    engine: "2.5 L I4",
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    electricCompressor: false,
    compressorType: "cycling_clutch",
    labelChargeG: 650,
    oilType: "PAG 46",
  },
  {
    key: "tacoma",
    customerKey: "brandvold",
    year: 2015,
    make: "Toyota",
    model: "Tacoma",
    engine: "4.0 L V6",
    refrigerant: "R-134a",
    expansionDevice: "orifice_tube",
    electricCompressor: false,
    compressorType: "cycling_clutch",
    labelChargeG: 620,
    oilType: "PAG 46",
  },
];
