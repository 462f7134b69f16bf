import type { ReferencePublication } from "@/lib/credits/reference-data";

export function PublicationList({ items, label }: { items: readonly ReferencePublication[]; label: string }) {
  return (
    <ul aria-label={label} className="space-y-2">
      {items.map((p) => (
        <li key={p.id} className="card">
          <p className="font-bold">{p.citation}</p>
          <p className="text-ink-soft">{p.usedFor}</p>
        </li>
      ))}
    </ul>
  );
}
