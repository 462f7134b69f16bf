"use client";

import Link from "next/link";
import type { CaseListItem } from "@/lib/contracts/cases";
import { StatusBadge } from "./status-badge";

/** A case line as the list shows it: `updated` is the time already said on the shop's clock. */
export type CaseLine = CaseListItem & { updated: string };

/**
 * A page of case lines. One client component for the whole list, given plain rows: the page's payload
 * carries fifty short rows of data rather than fifty rendered trees handed to fifty links.
 */
export function CaseList({ cases, empty }: { cases: CaseLine[]; empty: string }) {
  if (cases.length === 0) return <p className="card text-ink-soft">{empty}</p>;
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
              <time dateTime={c.updatedAt}>{c.updated}</time>
            </p>
          </Link>
        </li>
      ))}
    </ul>
  );
}
