import type { DemoCase } from "./case-types";
import { harbourlineCases } from "./harbourline-cases";
import { ridgebackCases } from "./ridgeback-cases";

export type { DemoCase, DemoReadingSet, DemoSignOff } from "./case-types";
export const demoCases: DemoCase[] = [...harbourlineCases, ...ridgebackCases];
