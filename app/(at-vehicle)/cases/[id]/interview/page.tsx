import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { requireUser } from "@/lib/auth/guard";
import { mayDo, statusAfterSubmit } from "@/lib/cases/rules";
import { getCase } from "@/lib/server/cases";
import { getShop } from "@/lib/server/shops";
import { getProfile } from "@/lib/server/profile";
import { formatShopTime } from "@/lib/units/clock";
import { isAppError } from "@/lib/errors";
import { InterviewBoot } from "@/components/interview/interview-boot";
import { stepCautionCards } from "@/components/interview/step-caution-cards";
import type { SavedInterview } from "@/machines/interview-view";

export const metadata: Metadata = { title: "Interview" };

export default async function InterviewPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await requireUser("cases:write");
  const caseId = Number((await params).id);
  if (!Number.isInteger(caseId) || caseId <= 0) notFound();
  const [detail, shop, profile] = await Promise.all([
    getCase({ shopId: user.shopId, caseId }).catch((error) => {
      if (isAppError(error) && error.status === 404) notFound();
      throw error;
    }),
    getShop({ shopId: user.shopId }),
    getProfile({ user }),
  ]);
  if (!mayDo("edit", user, detail)) redirect(`/cases/${caseId}`);

  const saved = (detail.answers ?? {}) as Partial<SavedInterview>;
  const record: Partial<SavedInterview> = {
    ...saved,
    step: (detail.interviewStep ?? saved.step) as SavedInterview["step"],
  };
  return (
    <InterviewBoot
      caseId={caseId}
      version={detail.version}
      serverRecord={record}
      shop={{ altitudeM: shop.altitudeM }}
      units={profile.units}
      locale={profile.locale ?? shop.locale}
      waitsForSignOff={statusAfterSubmit(detail.technicianRole) === "awaiting_signoff"}
      review={{
        thread: detail.signOffs.map((s) => ({
          verdict: s.verdict,
          reviewer: s.reviewer,
          comment: s.comment,
          when: formatShopTime(new Date(s.createdAt), shop),
        })),
        earlierCause: detail.conclusionCause,
        earlierNotes: detail.conclusionNotes,
      }}
      heading={`Case ${caseId} · ${detail.vehicle ?? "vehicle"}`}
      vehicleId={detail.vehicleId}
      cautionCards={stepCautionCards(profile.units, { altitudeM: shop.altitudeM })}
    />
  );
}
