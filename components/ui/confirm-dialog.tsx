"use client";

import { useEffect, useId, useRef, useState } from "react";

/**
 * Asks before something that cannot simply be taken back (delete, retire, cancel a ledger line).
 * A native modal <dialog>: the browser keeps focus inside it and Escape closes it; focus goes
 * back to the button that opened it. With `reason`, the action waits for a few words of why.
 * It stays open on a failed answer, with the message and what was typed.
 */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  cancelLabel = "Go back",
  danger = false,
  reason,
  busy = false,
  error,
  onConfirm,
  onCancel,
}: {
  open: boolean;
  title: string;
  children?: React.ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  danger?: boolean;
  reason?: { label: string; hint?: string; minLength?: number };
  busy?: boolean;
  error?: string | null;
  onConfirm: (reason: string) => void;
  onCancel: () => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const opener = useRef<Element | null>(null);
  const id = useId();
  const [text, setText] = useState("");
  const [missing, setMissing] = useState<string | null>(null);

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) {
      opener.current = document.activeElement;
      setText("");
      setMissing(null);
      dialog.showModal();
    } else if (!open && dialog.open) {
      dialog.close();
      if (opener.current instanceof HTMLElement) opener.current.focus();
    }
  }, [open]);

  function confirm(e: React.FormEvent) {
    e.preventDefault();
    const minLength = reason?.minLength ?? 3;
    if (reason && text.trim().length < minLength) {
      setMissing(`${reason.label}: a few words, please.`);
      return;
    }
    setMissing(null);
    onConfirm(text.trim());
  }

  const problem = missing ?? error ?? null;
  return (
    <dialog
      ref={ref}
      aria-labelledby={`${id}-title`}
      aria-describedby={children ? `${id}-body` : undefined}
      className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-card border-2 border-ink-muted bg-paper p-0 text-ink backdrop:bg-ink/60"
      onCancel={(e) => {
        e.preventDefault();
        if (!busy) onCancel();
      }}
    >
      <form onSubmit={confirm} noValidate className="space-y-3 p-4">
        <h2 id={`${id}-title`} className="text-xl font-bold">
          {title}
        </h2>
        {children && (
          <div id={`${id}-body`} className="space-y-2">
            {children}
          </div>
        )}
        {reason && (
          <div>
            <label htmlFor={`${id}-reason`} className="field-label">
              {reason.label}
            </label>
            <textarea
              id={`${id}-reason`}
              className="field-input min-h-24 py-2"
              value={text}
              maxLength={200}
              onChange={(e) => setText(e.target.value)}
              aria-invalid={missing ? true : undefined}
              aria-describedby={
                [reason.hint ? `${id}-hint` : null, problem ? `${id}-problem` : null]
                  .filter(Boolean)
                  .join(" ") || undefined
              }
            />
            {reason.hint && (
              <p id={`${id}-hint`} className="mt-1 text-sm text-ink-soft">
                {reason.hint}
              </p>
            )}
          </div>
        )}
        {problem && (
          <p id={`${id}-problem`} role="alert" className="field-error">
            {problem}
          </p>
        )}
        <div className="flex flex-wrap gap-2">
          <button
            type="submit"
            className={danger ? "btn-danger flex-1" : "btn-primary flex-1"}
            disabled={busy}
          >
            {busy ? "Working…" : confirmLabel}
          </button>
          <button type="button" className="btn-quiet flex-1" onClick={onCancel} disabled={busy}>
            {cancelLabel}
          </button>
        </div>
      </form>
    </dialog>
  );
}
