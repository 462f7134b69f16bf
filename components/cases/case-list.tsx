import Link from "next/link";
import type { CaseListItem } from "@/lib/contracts/cases";
import { StatusBadge } from "./status-badge";
import { formatShopTime, type ShopClock } from "@/lib/units/clock";

/**
 * A page of case lines, rendered on the server only: each time is said on the shop's clock here (as
 * ShopTime would), so fifty lines carry no client component of their own beyond the link.
 */
export function CaseList({
  cases,
  empty,
  clock,
}: {
  cases: CaseListItem[];
  empty: string;
  clock: ShopClock;
}) {
  if (cases.length === 0) return <p className="card text-ink-soft">{empty}</p>;
  const now = new Date();
  return (
    <ul className="space-y-3">
      {cases.map((c) => (
        <li key={c.id}>
          <Link href={`/cases/${c.id}`} className="card block hover:border-glacier-500">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <span className="font-bold">{c.vehicle ?? "Vehicle not recorded"}</span>
              <StatusBadge status={c.status} />
            </div>
            <p className="mt-1 line-clamp-2 text-ink-soft">&ldquo;{c.complaint}&rdquo;</p>
            <p className="mt-1 text-sm text-ink-muted">
              Case {c.id} · {c.customer ?? "no customer"} · {c.technician} ·{" "}
              <time dateTime={c.updatedAt}>{formatShopTime(new Date(c.updatedAt), clock, now)}</time>
            </p>
          </Link>
        </li>
      ))}
    </ul>
  );
}
