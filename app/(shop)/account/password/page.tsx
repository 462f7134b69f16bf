import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/guard";
import { ChangePasswordForm } from "@/components/account/change-password-form";

export const metadata: Metadata = { title: "Your password" };

export default async function PasswordPage() {
  const user = await requireUser();
  return (
    <div className="mx-auto max-w-xl space-y-4">
      <h1 className="text-2xl font-bold">Your password</h1>
      <p className="text-ink-soft">
        Signed in as {user.email}. Changing the password signs you out on every other phone and computer; this
        one stays signed in. Forgotten it? The shop owner can set a temporary one for you.
      </p>
      <div className="card">
        <ChangePasswordForm email={user.email} temporary={false} />
      </div>
    </div>
  );
}
