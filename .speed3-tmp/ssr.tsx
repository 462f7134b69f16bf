import React from "react";
(globalThis as any).React = React;
import { readFileSync } from "node:fs";
import { renderToString } from "react-dom/server";
import { QueryClient, QueryClientProvider } from "@tanstack/react-query";
import { LedgerReport } from "@/components/ledger/ledger-report";
import { MovementList } from "@/components/ledger/movement-list";
import { CylinderList } from "@/components/ledger/cylinder-list";
import { ledgerKeys } from "@/lib/queries/ledger";
const report = JSON.parse(readFileSync("/tmp/speed3-out/report12.json", "utf8"));
const movements = JSON.parse(readFileSync("/tmp/speed3-out/movements.json", "utf8"));
const cylinders = JSON.parse(readFileSync("/tmp/speed3-out/cylinders.json", "utf8"));
const viewer = { massUnit: "kg", timeZone: "America/Halifax", canWrite: true, canCancelAny: false, userId: movements.movements[0].technicianId } as const;
function render(which: string) {
  const qc = new QueryClient({ defaultOptions: { queries: { staleTime: 30_000 } } });
  qc.setQueryData(ledgerKeys.report(12), report);
  qc.setQueryData(ledgerKeys.movements(), { pages: [movements], pageParams: [null] });
  qc.setQueryData(ledgerKeys.cylinders(), { pages: [cylinders], pageParams: [null] });
  const el = which === "report" ? <LedgerReport massUnit="kg" /> : which === "movements" ? <MovementList viewer={viewer} /> : <CylinderList massUnit="kg" canWrite />;
  return renderToString(<QueryClientProvider client={qc}>{el}</QueryClientProvider>);
}
for (const which of ["report", "movements", "cylinders"]) {
  for (let i = 0; i < 50; i++) render(which);
  const t = process.cpuUsage(); const N = 200; let len = 0;
  for (let i = 0; i < N; i++) len = render(which).length;
  const u = process.cpuUsage(t);
  console.log(which, ((u.user + u.system) / 1000 / N).toFixed(2), "ms", len, "chars");
}
