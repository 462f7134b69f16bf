import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { requireUser } from "@/lib/auth/guard";
import { caseAbilities, caseRefusal, isOwnConclusionRefusal } from "@/lib/cases/rules";
import { can } from "@/lib/auth/roles";
import { getCase } from "@/lib/server/cases";
import { isAppError } from "@/lib/errors";
import { EXPANSION_DEVICE_LABELS, isExpansionDevice } from "@/lib/vehicles/expansion-devices";
import { StatusBadge } from "@/components/cases/status-badge";
import { CaseReadings } from "@/components/cases/case-readings";
import { FindingsSnapshot } from "@/components/cases/findings-snapshot";
import { SignOffForm } from "@/components/cases/sign-off-form";
import { ownerPanelData } from "@/lib/server/owner-panel";
import { OwnerSummaryPanel } from "@/components/owner/owner-summary-panel";
import { ProposalPanel } from "@/components/owner/proposal-panel";
import { CasePhotos } from "@/components/photos/case-photos";
import { caseComebackLinks } from "@/lib/server/casebook/case-flags";
import { ComebackBadge } from "@/components/casebook/comeback-badge";
import { SimilarCasesPanel } from "@/components/casebook/similar-cases-panel";

export const metadata: Metadata = { title: "Case" };

export default async function CasePage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireUser("cases:read");
  const caseId = Number((await params).id);
  if (!Number.isInteger(caseId) || caseId <= 0) notFound();
  const detail = await getCase({ shopId: user.shopId, caseId }).catch((error) => {
    if (isAppError(error) && error.status === 404) notFound();
    throw error;
  });
  const record = (detail.answers ?? {}) as { answers?: Record<string, never> };
  const may = caseAbilities(user, detail);
  const wroteIt = isOwnConclusionRefusal(caseRefusal("sign_off", user, detail));
  const [owner, comeback] = await Promise.all([
    ownerPanelData({ user, caseId: detail.id }),
    caseComebackLinks({ shopId: user.shopId, caseId: detail.id }),
  ]);
  const findings = detail.findings as Parameters<typeof FindingsSnapshot>[0]["findings"] | null;
  return (
    <article className="space-y-4">
      <header className="flex flex-wrap items-center justify-between gap-2">
        <h1 className="text-2xl font-bold">
          Case {detail.id}: {detail.vehicle ?? "vehicle not recorded"}
        </h1>
        <span className="flex flex-wrap items-center gap-2">
          <StatusBadge status={detail.status} />
          <ComebackBadge {...comeback} linked />
        </span>
      </header>
      {may.edit && (
        <Link href={`/cases/${detail.id}/interview`} className="btn-primary min-h-glove w-full text-lg">
          {detail.status === "sent_back" ? "Reopen the interview" : "Continue the interview"}
        </Link>
      )}
      {detail.signOffs.length > 0 && (
        <section className="card" aria-labelledby="review-heading">
          <h2 id="review-heading" className="text-lg font-bold">
            Sign-off
          </h2>
          <ul className="mt-2 space-y-2">
            {detail.signOffs.map((s, i) => (
              <li key={i}>
                <span className="font-bold">{s.verdict === "signed_off" ? "Signed off" : "Sent back"}</span>{" "}
                by {s.reviewer}
                {s.comment ? `: “${s.comment}”` : ""}
              </li>
            ))}
          </ul>
        </section>
      )}
      {may.sign_off && may.send_back && <SignOffForm caseId={detail.id} />}
      {wroteIt && (
        <p
          className="card border-2 border-caution-500 bg-caution-50 text-caution-700"
          data-testid="own-conclusion"
        >
          You saved this case&apos;s interview or submitted its conclusion, so it is partly your work. Another
          senior or the owner signs it off.
        </p>
      )}
      <section className="card">
        <h2 className="text-lg font-bold">Complaint, in the owner&apos;s words</h2>
        <p className="mt-1">&ldquo;{detail.complaint}&rdquo;</p>
        <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
          <dt className="font-bold">Customer</dt>
          <dd>{detail.customer ?? "—"}</dd>
          <dt className="font-bold">Technician</dt>
          <dd>{detail.technician}</dd>
          <dt className="font-bold">Refrigerant</dt>
          <dd>{detail.refrigerant ?? "—"}</dd>
          <dt className="font-bold">Expansion device</dt>
          <dd>
            {isExpansionDevice(detail.expansionDevice)
              ? EXPANSION_DEVICE_LABELS[detail.expansionDevice]
              : "—"}
          </dd>
        </dl>
      </section>
      <CaseReadings answers={record.answers ?? {}} />
      {findings && Array.isArray(findings.suspects) ? (
        <FindingsSnapshot
          findings={findings}
          conclusionCause={detail.conclusionCause}
          conclusionNotes={detail.conclusionNotes}
        />
      ) : (
        detail.conclusionNotes && (
          <section className="card">
            <h2 className="text-lg font-bold">Technician&apos;s conclusion</h2>
            <p className="mt-1">{detail.conclusionNotes}</p>
          </section>
        )
      )}
      {can(user.role, "casebook:search") && <SimilarCasesPanel caseId={detail.id} />}
      <CasePhotos caseId={detail.id} mayAct={owner.mayAct} attachments={owner.attachments} />
      <ProposalPanel
        caseId={detail.id}
        mayAct={owner.mayAct}
        proposal={owner.proposal}
        suggested={owner.suggestedRepairs}
      />
      <OwnerSummaryPanel
        caseId={detail.id}
        available={owner.available}
        mayAct={owner.mayAct}
        customerEmail={owner.customerEmail}
        links={owner.links}
        emails={owner.emails}
      />
      <section className="card">
        <h2 className="text-lg font-bold">Service record</h2>
        <p className="mt-1">
          Recovery, evacuation and hold, oil and the recharge by weight; each step posts to the refrigerant
          ledger.
        </p>
        <Link href={`/cases/${detail.id}/service`} className="btn-quiet mt-2">
          Open the service record
        </Link>
      </section>
    </article>
  );
}
