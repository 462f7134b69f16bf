import Link from "next/link";

/** Says a case is one side of a comeback: back after an earlier repair, or came back later. */
export function ComebackBadge({
  comebackOfCaseId,
  cameBackCaseId,
  linked = false,
}: {
  comebackOfCaseId: number | null;
  cameBackCaseId: number | null;
  linked?: boolean;
}) {
  if (!comebackOfCaseId && !cameBackCaseId) return null;
  const other = comebackOfCaseId ?? cameBackCaseId;
  const text = comebackOfCaseId
    ? `Comeback after case ${comebackOfCaseId}`
    : `Came back as case ${cameBackCaseId}`;
  return (
    <span className="inline-block rounded-full border-2 border-ember-500 bg-ember-50 px-2 py-0.5 text-sm font-bold text-ember-700">
      {linked && other ? (
        <Link href={`/cases/${other}`} className="inline-flex min-h-touch items-center underline">
          {text}
        </Link>
      ) : (
        text
      )}
    </span>
  );
}
