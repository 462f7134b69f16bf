import type { GroupId, InterviewAnswers, StepId } from "@/lib/interview";
import type { CaseStatus, ReadingSetKind, SignOffVerdict } from "@/models";

export type DemoReadingSet = {
  kind: ReadingSetKind;
  minutesIn: number;
  ambientC: number;
  relativeHumidityPct: number | null;
  engineRpm: number | null;
  staticKpaGauge?: number;
  highKpaGauge?: number;
  lowKpaGauge?: number;
  liquidLineC?: number;
  suctionLineC?: number;
  ventC?: number;
};

export type DemoSignOff = {
  reviewerKey: string;
  verdict: SignOffVerdict;
  comment: string;
  minutesIn: number;
};

export type DemoCase = {
  key: string;
  shopKey: string;
  vehicleKey: string;
  technicianKey: string;
  status: CaseStatus;
  daysAgo: number;
  complaint: string;
  interviewStep: StepId;
  /** The interview's answers in its own shape, so a draft resumes where it was left. */
  answers: InterviewAnswers;
  /** Question groups the technician chose to skip. */
  skipped?: GroupId[];
  /** True once the interview reached findings: the seed then runs the findings engine on the answers. */
  diagnosed: boolean;
  conclusionCause: string | null;
  conclusionNotes: string | null;
  confirmedRepair: string | null;
  submittedMinutesIn: number | null;
  /** For a closed case: when it was closed, after the repair. */
  closedMinutesIn?: number;
  /** For a closed case: what the repair confirmed (cause ids or none_found) and the repairs done. */
  outcome?: { causes: string[]; repairIds: string[]; note?: string };
  readingSets: DemoReadingSet[];
  signOffs: DemoSignOff[];
};
