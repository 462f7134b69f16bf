import type { Metadata } from "next";
import { requireUser } from "@/lib/auth/guard";
import { listCases } from "@/lib/server/cases";
import Link from "next/link";
import { can } from "@/lib/auth/roles";
import { CaseList } from "@/components/cases/case-list";

export const metadata: Metadata = { title: "Cases" };

export default async function CasesPage() {
  const user = await requireUser("cases:read");
  const cases = await listCases({ shopId: user.shopId });
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
      <CaseList cases={cases} empty="No cases yet." />
    </>
  );
}
