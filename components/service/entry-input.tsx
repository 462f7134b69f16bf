import { useId } from "react";

/** A labelled text input for a typed quantity ("650 g", "1 lb 7 oz"); keeps what was typed even when it cannot be read. */
export function EntryInput({
  label,
  value,
  onChange,
  hint,
  error,
  type = "text",
  inputMode = "decimal",
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  hint?: string;
  error?: string;
  type?: "text" | "datetime-local";
  inputMode?: "decimal" | "text";
}) {
  const id = useId();
  const describedBy =
    [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean).join(" ") || undefined;
  return (
    <div>
      <label htmlFor={id} className="field-label">
        {label}
      </label>
      <input
        id={id}
        type={type}
        inputMode={type === "text" ? inputMode : undefined}
        autoComplete="off"
        className="field-input"
        value={value}
        onChange={(e) => onChange(e.target.value)}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
      />
      {hint && (
        <p id={`${id}-hint`} className="mt-1 text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="field-error">
          {error}
        </p>
      )}
    </div>
  );
}
