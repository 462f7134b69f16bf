import { clsx } from "clsx";

export type Tone = "good" | "bad" | "info";
const TONE: Record<Tone, string> = {
  good: "border-sound-500 bg-sound-50 text-sound-700",
  bad: "border-ember-500 bg-ember-50 text-ember-700",
  info: "border-glacier-500 bg-glacier-50 text-glacier-900",
};
const WORD: Record<Tone, string> = { good: "OK", bad: "Check", info: "Worked out" };

/** One computed result as the technician types, with what it rests on. */
export function ResultLine({
  tone,
  children,
  sources,
  testId,
}: {
  tone: Tone;
  children: React.ReactNode;
  sources?: readonly string[];
  testId?: string;
}) {
  return (
    <div className={clsx("rounded-card border-2 p-3", TONE[tone])} data-testid={testId}>
      <p>
        <strong>{WORD[tone]}:</strong> {children}
      </p>
      {sources && sources.length > 0 && (
        <p className="mt-1 text-sm opacity-90">Source: {[...new Set(sources)].join("; ")}</p>
      )}
    </div>
  );
}
