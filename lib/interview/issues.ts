/** One plain message tied to a field of a question group ("" for the group as a whole). */
export interface AnswerIssue {
  field: string;
  message: string;
}
