"use client";

import { useReaderUnits } from "@/components/shell/reader-units";
import type { Quantity } from "@/lib/units/quantity";

type Answers = {
  conditions?: { ambientC?: number; relativeHumidityPct?: number; engineRpm?: number };
  static?: { staticKpaGauge?: number };
  running?: {
    highKpaGauge?: number;
    lowKpaGauge?: number;
    liquidLineC?: number;
    suctionLineC?: number;
    ventC?: number;
  };
  identification?: { purityPct?: number; airPct?: number };
  chargeAudit?: { recovered?: boolean; recoveredChargeG?: number; oilRemovedMl?: number };
};

/** The readings as the technician entered them, said in the reader's units. */
export function CaseReadings({ answers }: { answers: Answers }) {
  const { format } = useReaderUnits();
  const said = (value: number | undefined, kind: Quantity["kind"]) =>
    value === undefined ? "—" : format({ value, kind });
  const pressure = (kpa?: number) => said(kpa, "pressure_gauge");
  const temperature = (c?: number) => said(c, "temperature");
  const rows: [string, string][] = [
    ["Air temperature", temperature(answers.conditions?.ambientC)],
    [
      "Relative humidity",
      answers.conditions?.relativeHumidityPct === undefined
        ? "—"
        : `${answers.conditions.relativeHumidityPct} %`,
    ],
    ["Static pressure", pressure(answers.static?.staticKpaGauge)],
    ["High side", pressure(answers.running?.highKpaGauge)],
    ["Low side", pressure(answers.running?.lowKpaGauge)],
    ["Liquid line", temperature(answers.running?.liquidLineC)],
    ["Suction line", temperature(answers.running?.suctionLineC)],
    ["Centre vent", temperature(answers.running?.ventC)],
    [
      "Identifier",
      answers.identification?.purityPct === undefined
        ? "—"
        : `${answers.identification.purityPct} % pure, ${answers.identification.airPct ?? "?"} % air`,
    ],
    [
      "Recovered",
      answers.chargeAudit?.recoveredChargeG === undefined
        ? "—"
        : `${said(answers.chargeAudit.recoveredChargeG, "mass")}, ${
            answers.chargeAudit.oilRemovedMl === undefined
              ? "oil not measured"
              : `${said(answers.chargeAudit.oilRemovedMl, "volume")} oil`
          }`,
    ],
  ];
  return (
    <section aria-labelledby="readings-heading" className="card">
      <h2 id="readings-heading" className="text-lg font-bold">
        Readings
      </h2>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 font-mono">
        {rows.map(([label, value]) => (
          <div key={label} className="contents">
            <dt className="font-sans font-bold">{label}</dt>
            <dd>{value}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
