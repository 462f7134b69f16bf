import Link from "next/link";
import { requireUser } from "@/lib/auth/guard";
import { navigationFor } from "@/lib/auth/navigation";
import { ROLE_LABELS } from "@/lib/auth/roles";
import { getShop } from "@/lib/server/shops";
import { ShopClockProvider } from "@/components/shell/shop-clock";
import { ReaderUnitsProvider } from "@/components/shell/reader-units-provider";
import { getProfile } from "@/lib/server/profile";
import { passwordMustChange } from "@/lib/server/passwords";
import { ChangePasswordOnDemand } from "@/components/account/change-password-on-demand";
import { BrandMark } from "@/components/shell/brand-mark";
import { NavLinks } from "@/components/shell/nav-links";
import { SignOutButton } from "@/components/auth/sign-out-button";

/**
 * The signed-in shell: header, navigation, the password gate and the shop's clock and units around the
 * page. Drawn by two layouts: (shop) for every page, inside TanStack Query's provider, and
 * (at-vehicle) for the interview, which loads the query client only with the parts that need it.
 */
export async function ShopShell({ children }: { children: React.ReactNode }) {
  const user = await requireUser();
  const [shop, mustChange, profile] = await Promise.all([
    getShop({ shopId: user.shopId }),
    passwordMustChange({ userId: user.id, shopId: user.shopId }),
    getProfile({ user }),
  ]);
  // Signed in with a temporary password an owner set: nothing else until they choose their own.
  const items = mustChange ? [] : navigationFor(user.role).map(({ href, label }) => ({ href, label }));
  return (
    <div className="min-h-dvh">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:bg-paper focus:p-2"
      >
        Skip to content
      </a>
      <header className="bg-glacier-900 text-white">
        <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-4 gap-y-2 px-3 py-2">
          <Link href="/cases" className="flex min-h-touch items-center gap-2 font-bold">
            <BrandMark className="h-8 w-8" tone="onDark" label="Chillwright" />
            <span className="text-lg" aria-hidden="true">
              Chillwright
            </span>
          </Link>
          <span className="text-sm text-glacier-100">{shop.name}</span>
          <div className="ml-auto flex items-center gap-2">
            <Link
              href="/account/password"
              className="inline-flex min-h-touch items-center text-sm underline-offset-4 hover:underline"
              data-testid="signed-in-as"
            >
              {user.name} · {ROLE_LABELS[user.role]}
              <span className="sr-only">: your password</span>
            </Link>
            <SignOutButton />
          </div>
        </div>
        <NavLinks items={items} />
      </header>
      <main id="main" className="mx-auto max-w-5xl px-3 py-4">
        {mustChange ? (
          <div className="mx-auto max-w-xl space-y-4">
            <h1 className="text-2xl font-bold">Choose your own password</h1>
            <p>
              You signed in with a temporary password the shop owner set. Choose a password only you know
              before you go on; the temporary one stops working once you do.
            </p>
            <div className="card">
              <ChangePasswordOnDemand email={user.email} temporary />
            </div>
          </div>
        ) : (
          <ShopClockProvider clock={{ timeZone: shop.timeZone, locale: shop.locale }}>
            <ReaderUnitsProvider profile={profile} altitudeM={shop.altitudeM}>
              {children}
            </ReaderUnitsProvider>
          </ShopClockProvider>
        )}
      </main>
      <footer className="mx-auto max-w-5xl px-3 pb-6 text-sm">
        <Link href="/credits" className="inline-flex min-h-touch items-center text-ink-soft underline">
          Credits and licences
        </Link>
      </footer>
    </div>
  );
}
