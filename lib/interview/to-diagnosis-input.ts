import type { DiagnosisInput } from "@/lib/diagnosis";
import type { InterviewAnswers } from "./answers";
import { type ShopSettings, toDiagnosisInput } from "./engine-input";
import { answersOnRoute } from "./route";

export { toDiagnosisInput } from "./engine-input";

/**
 * The input the findings should be computed from: only the answers on the current route count, so
 * running readings left over from before a system proved empty do not reach the engine. The screen
 * (viewOf) and the server should both use this.
 */
export function diagnosisInputFor(answers: InterviewAnswers, shop?: ShopSettings): DiagnosisInput | null {
  return toDiagnosisInput(answersOnRoute(answers, shop), shop);
}
