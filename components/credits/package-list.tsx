import type { CreditedPackage } from "@/lib/credits/packages";

/** Packages with their licences: name and author on the left, licence and version on the right. */
export function PackageList({ packages, label }: { packages: readonly CreditedPackage[]; label: string }) {
  return (
    <ul
      aria-label={label}
      className="divide-y divide-paper-line rounded-card border border-paper-line bg-paper"
    >
      {packages.map((p) => (
        <li key={`${p.name}@${p.version}`} className="flex flex-wrap items-baseline gap-x-3 px-3 py-2">
          <span className="min-w-0 flex-1">
            <span className="break-words font-bold">{p.name}</span>
            {p.author && <span className="block text-sm text-ink-soft">by {p.author}</span>}
          </span>
          <span className="text-right">
            <span className="block font-bold">{p.licence}</span>
            <span className="block font-mono text-sm text-ink-soft">
              {p.version}
              {p.optional ? " · some platforms" : ""}
            </span>
          </span>
        </li>
      ))}
    </ul>
  );
}
