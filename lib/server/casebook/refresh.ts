import "server-only";

// The casebook's derived rows are written by lib/db (scripts call it too); server code imports it here.
export { leadingSuspectOf, refreshCasebookEntry, reindexCasebook } from "@/lib/db/casebook-refresh";
