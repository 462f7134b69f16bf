import { clsx } from "clsx";
import { AlertTriangle, Info, ShieldAlert } from "lucide-react";

export interface CautionItem {
  id: string;
  title?: string;
  text: string;
  level?: "danger" | "warning" | "notice";
}

/** Safety and service cautions: danger and warnings open, the rest folded away but present. */
export function CautionsList({
  cautions,
  heading = "Cautions",
}: {
  cautions: CautionItem[];
  heading?: string;
}) {
  const loud = cautions.filter((c) => c.level === "danger" || c.level === "warning");
  const quiet = cautions.filter((c) => !(c.level === "danger" || c.level === "warning"));
  return (
    <section aria-label={heading} className="space-y-2">
      {loud.map((c) => (
        <div
          key={c.id}
          className={clsx(
            "flex gap-2 rounded-card border-2 p-3",
            c.level === "danger"
              ? "border-ember-500 bg-ember-50 text-ember-700"
              : "border-caution-500 bg-caution-50 text-caution-700",
          )}
        >
          {c.level === "danger" ? (
            <ShieldAlert aria-hidden className="mt-0.5 h-5 w-5 shrink-0" />
          ) : (
            <AlertTriangle aria-hidden className="mt-0.5 h-5 w-5 shrink-0" />
          )}
          <p>
            {c.title && (
              <strong>
                {c.level === "danger" ? "Danger: " : ""}
                {c.title}.{" "}
              </strong>
            )}
            {c.text}
          </p>
        </div>
      ))}
      {quiet.length > 0 && (
        <details className="rounded-card border border-paper-line bg-paper p-3">
          <summary className="min-h-touch cursor-pointer font-bold">
            <Info aria-hidden className="mr-1 inline h-5 w-5" />
            {quiet.length === 1 ? "1 more note" : `${quiet.length} more notes`}
          </summary>
          <ul className="mt-2 space-y-2">
            {quiet.map((c) => (
              <li key={c.id}>
                {c.title && <strong>{c.title}. </strong>}
                {c.text}
              </li>
            ))}
          </ul>
        </details>
      )}
    </section>
  );
}
