import type { Metadata } from "next";
import Link from "next/link";
import { redirect } from "next/navigation";
import { validateRequest } from "@/lib/auth/session";
import { env } from "@/lib/env";
import { safeNextPath } from "@/lib/security/safe-next-path";
import { SignInForm } from "@/components/auth/sign-in-form";
import { BrandMark } from "@/components/shell/brand-mark";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<{ next?: string | string[] }>;
}) {
  const { user } = await validateRequest();
  const { next } = await searchParams;
  const target = safeNextPath(next, env().APP_ORIGIN);
  if (user) redirect(target);
  return (
    <main className="mx-auto flex min-h-dvh max-w-md flex-col justify-center p-4">
      <div className="mb-6 flex items-center gap-3 text-glacier-700">
        <BrandMark className="h-12 w-12" tone="onLight" />
        <div>
          <p className="text-3xl font-bold tracking-tight">Chillwright</p>
          <p className="text-ink-soft">A/C diagnostic casebook</p>
        </div>
      </div>
      <section className="card" aria-labelledby="sign-in-heading">
        <h1 id="sign-in-heading" className="mb-4 text-2xl font-bold">
          Sign in
        </h1>
        <SignInForm next={target} />
      </section>
      <p className="mt-6 text-sm text-ink-soft">
        Refrigerant work is done by certified technicians, following the vehicle manufacturer&apos;s procedure
        and local codes.
      </p>
      <Link
        href="/credits"
        className="mt-2 inline-flex min-h-touch items-center text-sm text-ink-soft underline"
      >
        Credits and licences
      </Link>
    </main>
  );
}
