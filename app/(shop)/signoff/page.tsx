import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/guard";
import { listCases } from "@/lib/server/cases";
import { CaseList } from "@/components/cases/case-list";

export const metadata: Metadata = { title: "Sign-off" };

export default async function SignOffQueuePage() {
  const user = await requireUser("signoff:review");
  const { cases: waiting } = await listCases({ shopId: user.shopId, status: "awaiting_signoff", limit: 100 });
  return (
    <>
      <h1 className="mb-1 text-2xl font-bold">Waiting for sign-off</h1>
      <p className="mb-4 text-ink-soft">
        Apprentice diagnoses to check against the readings and the findings.
      </p>
      <CaseList cases={waiting} empty="Nothing is waiting for sign-off." />
    </>
  );
}
