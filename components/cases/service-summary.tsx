import Link from "next/link";
import { clsx } from "clsx";
import { CautionsList } from "@/components/cautions/cautions-list";
import { cautionsById } from "@/lib/cautions/catalog";
import type { SummaryLine } from "./service-summary-lines";

/**
 * The case page's summary of the service record and of what was ticked at the vehicle: every figure
 * in the reader's units, "not recorded" where nobody entered one.
 */
export function ServiceSummary({
  caseId,
  lines,
  symptoms,
  hasRecord,
  emptied,
  electricCompressor,
}: {
  caseId: number;
  lines: SummaryLine[];
  symptoms: string[];
  hasRecord: boolean;
  emptied: boolean;
  electricCompressor: boolean;
}) {
  const cautions = emptied
    ? cautionsById(electricCompressor ? ["empty_system", "electric_never_without_charge"] : ["empty_system"])
    : [];
  return (
    <section className="card space-y-3" aria-labelledby="service-summary-heading">
      <h2 id="service-summary-heading" className="text-lg font-bold">
        Service record
      </h2>
      {!hasRecord && <p>No service work recorded yet.</p>}
      {cautions.length > 0 && <CautionsList cautions={cautions} foldNotices={false} />}
      <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1" data-testid="service-summary">
        {lines.map((line) => (
          <div key={line.name} className="contents">
            <dt className="font-bold">{line.name}</dt>
            <dd className={clsx(line.flagged && "font-bold text-caution-700")}>{line.value}</dd>
          </div>
        ))}
      </dl>
      <div>
        <h3 className="font-bold">Symptoms ticked at the vehicle</h3>
        {symptoms.length > 0 ? (
          <ul className="mt-1 list-disc pl-6" data-testid="case-symptoms">
            {symptoms.map((s) => (
              <li key={s}>{s}</li>
            ))}
          </ul>
        ) : (
          <p className="mt-1">None ticked.</p>
        )}
      </div>
      <Link href={`/cases/${caseId}/service`} className="btn-quiet">
        Open the service record
      </Link>
    </section>
  );
}
