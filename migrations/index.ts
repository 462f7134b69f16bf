import type { QueryInterface } from "sequelize";
import type { RunnableMigration } from "umzug";
import * as m0001 from "./20261202-0001-create-shops-and-users";
import * as m0002 from "./20261202-0002-create-customers-and-vehicles";
import * as m0003 from "./20261202-0003-create-cases-and-reading-sets";
import * as m0004 from "./20261202-0004-create-sign-offs-and-audit-events";
import * as m0005 from "./20261202-0005-create-spec-table-and-ledger";
import * as m1001 from "./20261203-1001-create-owner-summary-tables";
import * as m2001 from "./20261203-2001-create-sign-in-throttle";
import * as m2002 from "./20261203-2002-add-spec-entry-match-key";
import * as m2003 from "./20261203-2003-create-user-invitations";
import * as m3001 from "./20261203-3001-add-compressor-type";
import * as m4001 from "./20261203-4001-drop-case-computed";
import * as m5001 from "./20261203-5001-add-shop-locale";
import * as m5002 from "./20261203-5002-name-service-record-figures-once";
import * as m6001 from "./20261203-6001-add-user-temporary-password";
import * as m7001 from "./20261203-7001-create-casebook-tables";
import * as m8001 from "./20261203-8001-add-user-units-and-locale";
import * as m8002 from "./20261203-8002-keep-vacuum-readings-to-the-micron";
import * as m9001 from "./20261203-9001-add-vehicle-plate-and-phone-search";
import * as m9002 from "./20261203-9002-add-case-conclusion-writers";
import * as m4301 from "./20261204-3001-keep-each-case-figure-once";
import * as m1204x5001 from "./20261204-5001-create-casebook-version";
import * as m1204x5002 from "./20261204-5002-index-short-casebook-words";
import * as m9101 from "./20261204-9001-index-vehicles-by-last-seen";

// Listed by hand, not globbed, so the same list works under tsx, vitest and a Next bundle.
// A new migration file goes here too; an integration test fails when one is missing.
export const migrations: RunnableMigration<QueryInterface>[] = [
  { name: "20261202-0001-create-shops-and-users", ...m0001 },
  { name: "20261202-0002-create-customers-and-vehicles", ...m0002 },
  { name: "20261202-0003-create-cases-and-reading-sets", ...m0003 },
  { name: "20261202-0004-create-sign-offs-and-audit-events", ...m0004 },
  { name: "20261202-0005-create-spec-table-and-ledger", ...m0005 },
  { name: "20261203-1001-create-owner-summary-tables", ...m1001 },
  { name: "20261203-2001-create-sign-in-throttle", ...m2001 },
  { name: "20261203-2002-add-spec-entry-match-key", ...m2002 },
  { name: "20261203-2003-create-user-invitations", ...m2003 },
  { name: "20261203-3001-add-compressor-type", ...m3001 },
  { name: "20261203-4001-drop-case-computed", ...m4001 },
  { name: "20261203-5001-add-shop-locale", ...m5001 },
  { name: "20261203-5002-name-service-record-figures-once", ...m5002 },
  { name: "20261203-6001-add-user-temporary-password", ...m6001 },
  { name: "20261203-7001-create-casebook-tables", ...m7001 },
  { name: "20261203-8001-add-user-units-and-locale", ...m8001 },
  { name: "20261203-8002-keep-vacuum-readings-to-the-micron", ...m8002 },
  { name: "20261203-9001-add-vehicle-plate-and-phone-search", ...m9001 },
  { name: "20261203-9002-add-case-conclusion-writers", ...m9002 },
  { name: "20261204-3001-keep-each-case-figure-once", ...m4301 },
  { name: "20261204-5001-create-casebook-version", ...m1204x5001 },
  { name: "20261204-5002-index-short-casebook-words", ...m1204x5002 },
  { name: "20261204-9001-index-vehicles-by-last-seen", ...m9101 },
];
