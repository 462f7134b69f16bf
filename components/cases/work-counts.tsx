import Link from "next/link";
import { clsx } from "clsx";
import type { WorkCounts } from "@/lib/contracts/work-counts";

interface Tile {
  label: string;
  count: number;
  href?: string;
  /** Something that waits on this person: drawn louder when it is not zero. */
  needsMe: boolean;
}

/** The home screen's first lines: how much waits on this person, and how much the shop has open. */
export function WorkCountsPanel({ counts }: { counts: WorkCounts }) {
  const tiles: Tile[] = [
    { label: "My drafts", count: counts.myDrafts, needsMe: true },
    { label: "Sent back to me", count: counts.sentBackToMe, needsMe: true },
    ...(counts.waitingForMySignOff === null
      ? []
      : [
          {
            label: "Waiting for my sign-off",
            count: counts.waitingForMySignOff,
            href: "/signoff",
            needsMe: true,
          },
        ]),
    { label: "Open in the shop", count: counts.shopOpen, needsMe: false },
  ];
  return (
    <section aria-labelledby="work-counts-heading" className="mb-4">
      <h2 id="work-counts-heading" className="sr-only">
        What needs you
      </h2>
      <ul className="grid grid-cols-2 gap-2 sm:grid-cols-4" data-testid="work-counts">
        {tiles.map((tile) => {
          const body = (
            <>
              <span className="block font-mono text-3xl font-bold">{tile.count}</span>
              <span className="block text-sm font-bold">{tile.label}</span>
            </>
          );
          const look = clsx(
            "card block min-h-touch p-3",
            tile.needsMe && tile.count > 0 && "border-2 border-glacier-600 bg-glacier-50 text-glacier-900",
          );
          return (
            <li key={tile.label}>
              {tile.href ? (
                <Link href={tile.href} className={clsx(look, "hover:border-glacier-500")}>
                  {body}
                </Link>
              ) : (
                <div className={look}>{body}</div>
              )}
            </li>
          );
        })}
      </ul>
    </section>
  );
}
