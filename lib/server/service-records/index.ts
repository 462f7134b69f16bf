import "server-only";

// The service record's persistence, in parts: mapping (contract ↔ rows), checks against the shop's
// own rows, ledger posting, and the save and removal that run them in one transaction. Its rules are
// pure, in lib/service/record-rules.ts.
export { getServiceCase, getServiceRecord, getServiceRecordView } from "./read";
export { saveServiceRecord } from "./save";
export { deleteServiceRecord } from "./remove";
