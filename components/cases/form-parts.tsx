import type { ReactNode } from "react";
import type { UseFormRegisterReturn } from "react-hook-form";

/**
 * The end of a case form (sign-off, close, reopen): the server's refusal or a lost connection,
 * announced, above the form's buttons.
 */
export function FormFooter({ error, children }: { error: string | null; children: ReactNode }) {
  return (
    <>
      {error && (
        <p role="alert" className="field-error">
          {error}
        </p>
      )}
      {children}
    </>
  );
}

/** A case form's written comment, reason or note, with its message announced beside it. */
export function CaseTextArea({
  id,
  label,
  error,
  registration,
}: {
  id: string;
  label: string;
  error: string | undefined;
  registration: UseFormRegisterReturn;
}) {
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <textarea
        id={id}
        rows={3}
        className="field-input py-2"
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        {...registration}
      />
      {error && (
        <p id={`${id}-error`} role="alert" className="field-error">
          {error}
        </p>
      )}
    </div>
  );
}
