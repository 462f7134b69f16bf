import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/guard";
import { signOffQueue } from "@/lib/server/work-counts";
import { SignOffQueueList } from "@/components/cases/sign-off-queue";

export const metadata: Metadata = { title: "Sign-off" };

export default async function SignOffQueuePage() {
  const user = await requireUser("signoff:review");
  const queue = await signOffQueue({ shopId: user.shopId });
  return (
    <>
      <h1 className="mb-1 text-2xl font-bold">Waiting for sign-off</h1>
      <p className="mb-2 text-ink-soft">
        Apprentice diagnoses to check against the readings and the findings, oldest first.
      </p>
      {/* eslint-disable-next-line react-hooks/purity -- a server page reads the clock once per request */}
      <SignOffQueueList queue={queue} nowMs={Date.now()} />
    </>
  );
}
