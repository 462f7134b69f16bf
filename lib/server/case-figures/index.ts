import "server-only";

// Each case figure typed once, stored once (lib/contracts/case-figures.ts): where each lives and how
// it is read (homes), and how the interview's and the service record's saves change it.
export { caseFigures, interviewRecordWithFigures } from "./homes";
export { saveInterviewFigures } from "./interview";
export { figuresBeforeRecordSave, saveRecordFigures } from "./record";
