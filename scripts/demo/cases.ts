import type { DemoCase } from "./case-types";
import { harbourlineCases } from "./harbourline-cases";
import { mazdaOvercharge } from "./owner-demo-case";
import { ridgebackCases } from "./ridgeback-cases";
import { casebookCases } from "./casebook-cases";

export type { DemoCase, DemoReadingSet, DemoSignOff } from "./case-types";
export const demoCases: DemoCase[] = [
  ...harbourlineCases,
  mazdaOvercharge,
  ...ridgebackCases,
  ...casebookCases,
];
