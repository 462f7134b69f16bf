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
import { caseOutcome } from "@/lib/server/casebook/outcome";
import { getServiceCase, getServiceRecord } from "@/lib/server/service-records";
import { getProfile } from "@/lib/server/profile";
import { getShop } from "@/lib/server/shops";
import { getPartOilAllowances } from "@/lib/server/oil-allowances";
import { formatShopTime } from "@/lib/units/clock";
import { CAUSE_IDS, CAUSE_LABELS, type CauseId } from "@/lib/diagnosis/causes";
import { SYMPTOM_LABELS, type SymptomId } from "@/lib/diagnosis/symptoms";
import { confirmedCauseLabel } from "@/lib/casebook/labels";
import { REPAIR_CATALOG, REPAIR_IDS, type RepairId } from "@/lib/repairs/catalog";
import { ServiceSummary } from "@/components/cases/service-summary";
import {
  emptiedNotRecharged,
  serviceSummaryLines,
  summaryValuesOf,
} from "@/components/cases/service-summary-lines";
import { CaseOutcomeForm } from "@/components/cases/case-outcome-form";
import { CaseReopenForm } from "@/components/cases/case-reopen-form";
import { CaseOutcomeHistory, CaseOutcomeSummary } from "@/components/cases/case-outcome-view";

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
  const ticked = (record.answers as { behaviour?: { symptoms?: unknown } } | undefined)?.behaviour?.symptoms;
  const may = caseAbilities(user, detail);
  const wroteIt = isOwnConclusionRefusal(caseRefusal("sign_off", user, detail));
  const [owner, comeback, outcome, serviceCase, service, profile, shop, allowancesMl] = await Promise.all([
    ownerPanelData({ user, caseId: detail.id }),
    caseComebackLinks({ shopId: user.shopId, caseId: detail.id }),
    caseOutcome({ shopId: user.shopId, caseId: detail.id }),
    getServiceCase({ shopId: user.shopId, caseId: detail.id }),
    getServiceRecord({ shopId: user.shopId, caseId: detail.id }),
    getProfile({ user }),
    getShop({ shopId: user.shopId }),
    getPartOilAllowances({ shopId: user.shopId }),
  ]);
  const serviceValues = summaryValuesOf(service, serviceCase);
  const summaryLines = serviceSummaryLines({
    values: serviceValues,
    units: profile.units,
    altitudeM: shop.altitudeM,
    allowancesMl,
    electricCompressor: serviceCase.electricCompressor,
  });
  const symptoms = (Array.isArray(ticked) ? (ticked as string[]) : []).map((s) =>
    s in SYMPTOM_LABELS ? SYMPTOM_LABELS[s as SymptomId] : s,
  );
  const clock = { timeZone: shop.timeZone, locale: shop.locale };
  // The findings' leading causes (and the technician's conclusion) in view, with none found; the rest of
  // the engine's causes folded. The repairs proposed or suggested for the case in view, the rest folded.
  const conclusion = detail.conclusionCause;
  const ranked = ((detail.findings as { suspects?: { cause?: string }[] } | null)?.suspects ?? [])
    .map((s) => s.cause)
    .filter((c): c is CauseId => typeof c === "string" && c in CAUSE_LABELS);
  const leadingCauses = new Set<string>([
    ...(conclusion && conclusion in CAUSE_LABELS ? [conclusion] : []),
    ...ranked.slice(0, 3),
  ]);
  const causeChoice = (id: string) => ({ id, label: confirmedCauseLabel(id) });
  const causeChoices = {
    shown: [...leadingCauses, "none_found"].map(causeChoice),
    more: [...ranked, ...CAUSE_IDS]
      .filter((id, i, all) => !leadingCauses.has(id) && all.indexOf(id) === i)
      .map(causeChoice),
  };
  const likelyRepairs = new Set<string>([
    ...(owner.proposal?.repairs.map((r) => r.id) ?? []),
    ...owner.suggestedRepairs,
  ]);
  const repairChoice = (id: RepairId) => ({ id, label: REPAIR_CATALOG[id].tradeLabel });
  const repairChoices =
    likelyRepairs.size > 0
      ? {
          shown: REPAIR_IDS.filter((id) => likelyRepairs.has(id)).map(repairChoice),
          more: REPAIR_IDS.filter((id) => !likelyRepairs.has(id)).map(repairChoice),
        }
      : { shown: REPAIR_IDS.map(repairChoice), more: [] };
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
      {detail.status === "closed" && outcome.causes.length > 0 && (
        <CaseOutcomeSummary
          outcome={outcome}
          closedWhen={outcome.closedAt ? formatShopTime(new Date(outcome.closedAt), clock) : null}
        />
      )}
      <CaseOutcomeHistory
        events={outcome.history.map((e) => ({ ...e, when: formatShopTime(new Date(e.at), clock) }))}
      />
      {may.close && (
        <CaseOutcomeForm
          caseId={detail.id}
          causes={causeChoices}
          repairs={repairChoices}
          defaults={{
            causes: conclusion && conclusion in CAUSE_LABELS ? [conclusion as CauseId] : [],
            repairIds: [],
          }}
        />
      )}
      {may.reopen && <CaseReopenForm caseId={detail.id} />}
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
      <ServiceSummary
        caseId={detail.id}
        lines={summaryLines}
        symptoms={symptoms}
        hasRecord={service !== null}
        emptied={emptiedNotRecharged(serviceValues)}
        electricCompressor={serviceCase.electricCompressor}
      />
    </article>
  );
}
