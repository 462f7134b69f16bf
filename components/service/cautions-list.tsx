import { clsx } from "clsx";
import type { ServiceCaution } from "@/lib/service/cautions";

const TONE = {
  danger: "border-ember-500 bg-ember-50 text-ember-700",
  warning: "border-caution-500 bg-caution-50 text-caution-700",
  notice: "border-paper-line bg-paper-sunk text-ink",
} as const;
const WORD = { danger: "Danger", warning: "Caution", notice: "Note" } as const;

/** The step's cautions, each with where it comes from; the deferral to local rules comes last. */
export function CautionsList({
  cautions,
  title = "Before you go on",
}: {
  cautions: readonly ServiceCaution[];
  title?: string;
}) {
  if (cautions.length === 0) return null;
  return (
    <section aria-label={title} className="space-y-2">
      <h3 className="font-bold">{title}</h3>
      <ul className="space-y-2">
        {cautions.map((c) => (
          <li key={c.id} className={clsx("rounded-card border-l-8 p-3", TONE[c.severity])}>
            <p>
              <strong>{WORD[c.severity]}:</strong> {c.text}
            </p>
            <p className="mt-1 text-sm opacity-90">Source: {c.source}</p>
          </li>
        ))}
      </ul>
    </section>
  );
}
