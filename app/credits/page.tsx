import type { Metadata } from "next";
import Link from "next/link";
import { CREDITS } from "@/lib/credits/packages";
import { OTHER_REFERENCE_DATA, SATURATION_TABLE_PUBLICATIONS } from "@/lib/credits/reference-data";
import { BrandMark } from "@/components/shell/brand-mark";
import { PackageList } from "@/components/credits/package-list";
import { PublicationList } from "@/components/credits/publication-list";

export const metadata: Metadata = { title: "Credits and licences" };

/*
 * Public on purpose: the fonts and the JavaScript these licences cover reach every visitor, the sign-in
 * page included, so their notices are readable without an account. The page holds no shop data.
 */
export default function CreditsPage() {
  return (
    <div className="min-h-dvh">
      <header className="bg-glacier-900 text-white">
        <div className="mx-auto flex max-w-3xl items-center gap-3 px-3 py-2">
          <BrandMark className="h-8 w-8" tone="onDark" />
          <span className="text-lg font-bold">Chillwright</span>
          <Link
            href="/"
            className="ml-auto flex min-h-touch items-center font-bold text-glacier-100 underline"
          >
            Back to Chillwright
          </Link>
        </div>
      </header>
      <main id="main" className="mx-auto max-w-3xl space-y-8 px-3 py-4">
        <div className="space-y-2">
          <h1 className="text-2xl font-bold">Credits and licences</h1>
          <p className="text-ink-soft">
            Chillwright computes with published reference data and runs on open-source software. Each result
            on screen names the standard, paper or manual it rests on; this page credits the data and the
            software as a whole.
          </p>
        </div>

        <section aria-labelledby="reference-heading" className="space-y-3">
          <h2 id="reference-heading" className="text-xl font-bold">
            Reference data
          </h2>
          <h3 className="font-bold">Refrigerant saturation tables</h3>
          <PublicationList
            items={SATURATION_TABLE_PUBLICATIONS}
            label="Publications behind the saturation tables"
          />
          <h3 className="font-bold">Air, altitude and units</h3>
          <PublicationList items={OTHER_REFERENCE_DATA} label="Other reference data" />
        </section>

        <section aria-labelledby="software-heading" className="space-y-3">
          <h2 id="software-heading" className="text-xl font-bold">
            Open-source software
          </h2>
          <p className="text-ink-soft">
            The {CREDITS.direct.length} packages Chillwright depends on, each used under the licence its
            authors chose (shown as its SPDX identifier).
          </p>
          <PackageList packages={CREDITS.direct} label="Packages Chillwright depends on" />
          <details className="rounded-card border border-paper-line bg-paper-sunk p-3">
            <summary className="min-h-touch cursor-pointer font-bold">
              The {CREDITS.included.length} packages they bring with them
            </summary>
            <div className="mt-3">
              <PackageList packages={CREDITS.included} label="Packages the dependencies bring with them" />
            </div>
          </details>
          <p className="text-sm text-ink-soft">
            This list is generated from the project&apos;s package files by scripts/credits.ts.
          </p>
        </section>
      </main>
    </div>
  );
}
