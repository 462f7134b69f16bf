import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { isAppError } from "@/lib/errors";
import { publicOwnerSummary } from "@/lib/server/owner-summary";
import { tokenFromParams } from "@/lib/server/public-token";
import { OwnerSummaryView } from "@/components/owner/owner-summary-view";

export const dynamic = "force-dynamic";

export const metadata: Metadata = {
  title: "Your A/C: what we found",
  robots: { index: false, follow: false },
  referrer: "no-referrer",
};

/** The owner's page: public, behind the link's token; no sign-in. */
export default async function OwnerSummaryPage({ params }: { params: Promise<{ token: string }> }) {
  const bundle = await (async () => {
    const token = tokenFromParams(await params);
    return { token, ...(await publicOwnerSummary(token, { countView: true })) };
  })().catch((error) => {
    if (isAppError(error) && error.status === 404) notFound();
    throw error;
  });
  return <OwnerSummaryView token={bundle.token} summary={bundle.summary} photos={bundle.photos} />;
}
