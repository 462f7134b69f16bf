import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/guard";
import { listCases } from "@/lib/server/cases";
import Link from "next/link";
import { can } from "@/lib/auth/roles";
import { CaseList } from "@/components/cases/case-list";
import { workCounts } from "@/lib/server/work-counts";
import { getShop } from "@/lib/server/shops";
import { formatShopTime } from "@/lib/units/clock";
import { WorkCountsPanel } from "@/components/cases/work-counts";

export const metadata: Metadata = { title: "Cases" };

const PAGE_SIZE = 50;

export default async function CasesPage({ searchParams }: { searchParams: Promise<{ page?: string }> }) {
  const user = await requireUser("cases:read");
  const requested = Number((await searchParams).page ?? 1);
  const page = Number.isInteger(requested) && requested >= 1 && requested <= 2000 ? requested : 1;
  const [{ cases, nextOffset }, counts, shop] = await Promise.all([
    listCases({ shopId: user.shopId, limit: PAGE_SIZE, offset: (page - 1) * PAGE_SIZE }),
    workCounts({ user }),
    getShop({ shopId: user.shopId }),
  ]);
  // Each line's time is said here, on the shop's clock, so the list renders the same on both sides.
  const clock = { timeZone: shop.timeZone, locale: shop.locale };
  const now = new Date();
  return (
    <>
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold">Cases</h1>
        {can(user.role, "cases:write") && (
          <Link href="/cases/new" className="btn-primary">
            New case
          </Link>
        )}
      </div>
      <WorkCountsPanel counts={counts} />
      <CaseList
        cases={cases.map((c) => ({ ...c, updated: formatShopTime(new Date(c.updatedAt), clock, now) }))}
        empty={page === 1 ? "No cases yet." : "No cases on this page."}
      />
      {(page > 1 || nextOffset !== null) && (
        <nav aria-label="Pages" className="mt-4 flex flex-wrap items-center justify-between gap-2">
          {page > 1 ? (
            <Link href={page === 2 ? "/cases" : `/cases?page=${page - 1}`} className="btn-quiet">
              Newer cases
            </Link>
          ) : (
            <span />
          )}
          <span>Page {page}</span>
          {nextOffset !== null ? (
            <Link href={`/cases?page=${page + 1}`} className="btn-quiet">
              Older cases
            </Link>
          ) : (
            <span />
          )}
        </nav>
      )}
    </>
  );
}
