import type { ServiceCaseContext, ServiceRecordDto } from "@/lib/contracts/service-records";
import type { ReplacedPartId } from "@/lib/service/oil";
import type { ShopUnitsPrefs } from "./draft";

// What the page hands the service record form; the form and its step fields both read it.

export interface CylinderChoice {
  id: number;
  label: string;
  kind: "recovery" | "virgin" | "recycled";
  netG: number;
  fillMessage: string;
}

export interface SpecChoice {
  id: number;
  description: string;
  labelChargeG: number;
  oilType: string;
  totalOilMl: number | null;
  reasons: string[];
}

export interface ServiceRecordFormProps {
  caseId: number;
  serviceCase: ServiceCaseContext;
  record: ServiceRecordDto | null;
  cylinders: CylinderChoice[];
  specChoices: SpecChoice[];
  allowancesMl: Partial<Record<ReplacedPartId, number | null>>;
  units: ShopUnitsPrefs;
  /** null when this user may save; otherwise why not, shown instead of the save button */
  readOnlyReason: string | null;
}
