/**
 * Facts a technician rarely needs (the findings engine's version, a record's id) behind one quiet
 * line, so they never sit in the wording of the work itself.
 */
export function DetailsLine({ children, testId }: { children: React.ReactNode; testId?: string }) {
  return (
    <details className="text-sm text-ink-soft" data-testid={testId}>
      <summary className="inline-flex min-h-touch cursor-pointer items-center">Details</summary>
      <div className="space-y-1 pb-1">{children}</div>
    </details>
  );
}
