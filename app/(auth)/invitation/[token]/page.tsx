import type { Metadata } from "next";
import Link from "next/link";
import { BrandMark } from "@/components/shell/brand-mark";
import { AcceptInvitationForm } from "@/components/auth/accept-invitation-form";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { invitationTokenSchema } from "@/lib/contracts/invitations";
import { viewInvitation, type InvitationView } from "@/lib/server/invitations";

export const metadata: Metadata = { title: "Join a shop" };

export default async function InvitationPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const parsed = invitationTokenSchema.safeParse(token);
  const view: InvitationView = parsed.success
    ? await viewInvitation({ token: parsed.data })
    : { state: "invalid" };

  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center p-4">
      <div className="mb-6 flex items-center gap-3 text-glacier-700">
        <BrandMark className="h-12 w-12" />
        <p className="text-3xl font-bold tracking-tight">Chillwright</p>
      </div>
      <section className="card" aria-labelledby="invitation-heading">
        {view.state === "open" && (
          <>
            <h1 id="invitation-heading" className="mb-2 text-2xl font-bold">
              Join {view.shopName}
            </h1>
            <p className="mb-4">
              You are invited as {ROLE_LABELS[view.role].toLowerCase()} with the address{" "}
              <strong className="break-all">{view.email}</strong>. Choose a password to finish.
            </p>
            <AcceptInvitationForm token={token} name={view.name} email={view.email} />
          </>
        )}
        {view.state === "address_taken" && (
          <>
            <h1 id="invitation-heading" className="mb-2 text-2xl font-bold">
              This address already has an account
            </h1>
            <p>
              <strong className="break-all">{view.email}</strong> already signs in to Chillwright, and an
              address belongs to one shop at a time. Ask {view.shopName} to invite another address, or{" "}
              <Link href="/sign-in" className="underline">
                sign in
              </Link>{" "}
              as you do now.
            </p>
          </>
        )}
        {view.state === "invalid" && (
          <>
            <h1 id="invitation-heading" className="mb-2 text-2xl font-bold">
              This link no longer works
            </h1>
            <p>
              It was used already, withdrawn, replaced by a newer invitation or is more than a week old. Ask
              the shop owner to invite you again.
            </p>
          </>
        )}
      </section>
    </main>
  );
}
