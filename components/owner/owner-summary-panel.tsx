"use client";

import { useState } from "react";
import type { OutboundEmailView } from "@/lib/contracts/emails";
import type { ShareLinkView } from "@/lib/contracts/owner-summary";
import { OWNER_SUMMARY_UNAVAILABLE } from "@/lib/owner/availability";
import {
  createOwnerLink,
  retryOwnerEmail,
  revokeOwnerLink,
  sendOwnerEmail,
} from "@/lib/queries/owner-summary";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";
import { useCaseAction } from "./use-case-action";
import { useShopTime } from "@/components/shell/shop-clock";

/** Links to the owner's page and the e-mails that carried them, with revoke and retry. */
export function OwnerSummaryPanel({
  caseId,
  available,
  mayAct,
  customerEmail,
  links,
  emails,
}: {
  caseId: number;
  available: boolean;
  mayAct: boolean;
  customerEmail: string | null;
  links: ShareLinkView[];
  emails: OutboundEmailView[];
}) {
  const when = useShopTime();
  const [to, setTo] = useState(customerEmail ?? "");
  const [newUrl, setNewUrl] = useState<string | null>(null);
  const send = useCaseAction((address: string) => sendOwnerEmail(caseId, { to: address }));
  const create = useCaseAction(
    () => createOwnerLink(caseId),
    (r) => setNewUrl(r.link.url),
  );
  const [revoking, setRevoking] = useState<number | null>(null);
  const revoke = useCaseAction(
    (linkId: number) => revokeOwnerLink(caseId, linkId),
    () => setRevoking(null),
  );
  const retry = useCaseAction((emailId: number) => retryOwnerEmail(caseId, emailId));
  const error = send.error ?? create.error ?? revoke.error ?? retry.error;
  return (
    <section aria-labelledby="owner-summary-heading" className="card space-y-3">
      <h2 id="owner-summary-heading" className="text-lg font-bold">
        Owner summary
      </h2>
      {!available ? (
        <p>{OWNER_SUMMARY_UNAVAILABLE}</p>
      ) : (
        mayAct && (
          <>
            <form
              className="space-y-2"
              onSubmit={(e) => {
                e.preventDefault();
                send.mutate(to);
              }}
            >
              <label htmlFor="owner-email" className="field-label">
                Owner&apos;s e-mail
              </label>
              <input
                id="owner-email"
                type="email"
                autoComplete="off"
                className="field-input"
                value={to}
                onChange={(e) => setTo(e.target.value)}
              />
              <button type="submit" className="btn-primary w-full" disabled={send.isPending}>
                Send the owner page by e-mail
              </button>
            </form>
            <button
              type="button"
              className="btn-quiet w-full"
              disabled={create.isPending}
              onClick={() => create.mutate(undefined)}
            >
              Make a link to copy
            </button>
            {newUrl && (
              <div>
                <label htmlFor="owner-link" className="field-label">
                  New link (shown once; it lasts 30 days)
                </label>
                <input
                  id="owner-link"
                  readOnly
                  className="field-input font-mono text-sm"
                  value={newUrl}
                  onFocus={(e) => e.target.select()}
                />
              </div>
            )}
          </>
        )
      )}
      {error && (
        <p role="alert" className="field-error">
          {error}
        </p>
      )}
      {emails.length > 0 && (
        <EmailList
          emails={emails}
          mayAct={mayAct}
          onRetry={(id) => retry.mutate(id)}
          busy={retry.isPending}
        />
      )}
      {links.length > 0 && (
        <div>
          <h3 className="font-bold">Links</h3>
          <ul className="mt-1 space-y-2" data-testid="owner-links">
            {links.map((l) => (
              <li
                key={l.id}
                className="flex flex-wrap items-center justify-between gap-2 border-t border-paper-line pt-2"
              >
                <span>
                  Link {l.id} by {l.createdBy}, {when(l.createdAt)}:{" "}
                  <strong>{l.state === "active" ? `active until ${when(l.expiresAt)}` : l.state}</strong>
                  {l.viewCount > 0 && ` · opened ${l.viewCount} time${l.viewCount === 1 ? "" : "s"}`}
                </span>
                {mayAct && l.state === "active" && (
                  <button
                    type="button"
                    className="btn-danger"
                    disabled={revoke.isPending}
                    onClick={() => setRevoking(l.id)}
                  >
                    Revoke link {l.id}…
                  </button>
                )}
              </li>
            ))}
          </ul>
        </div>
      )}
      <ConfirmDialog
        open={revoking !== null}
        title={`Revoke link ${revoking ?? ""}?`}
        confirmLabel="Revoke the link"
        danger
        busy={revoke.isPending}
        error={revoking !== null ? revoke.error : null}
        onConfirm={() => revoking !== null && revoke.mutate(revoking)}
        onCancel={() => setRevoking(null)}
      >
        <p>
          The owner&apos;s page at this link stops working at once, for anyone who has it. You can make a new
          link afterwards.
        </p>
      </ConfirmDialog>
    </section>
  );
}

function EmailList({
  emails,
  mayAct,
  onRetry,
  busy,
}: {
  emails: OutboundEmailView[];
  mayAct: boolean;
  onRetry: (id: number) => void;
  busy: boolean;
}) {
  const when = useShopTime();
  return (
    <div>
      <h3 className="font-bold">E-mails</h3>
      <ul className="mt-1 space-y-2" data-testid="owner-emails">
        {emails.map((e) => (
          <li key={e.id} className="border-t border-paper-line pt-2">
            <p>
              To {e.to}, {when(e.createdAt)}:{" "}
              <strong className={e.status === "failed" ? "text-ember-700" : undefined}>
                {e.status === "sent"
                  ? `sent ${e.sentAt ? when(e.sentAt) : ""}`
                  : e.status === "failed"
                    ? "not sent"
                    : "waiting to send"}
              </strong>
              {e.attempts > 1 && ` after ${e.attempts} attempts`}
            </p>
            {e.status === "failed" && e.lastError && <p className="text-ember-700">{e.lastError}</p>}
            {mayAct && e.status !== "sent" && (
              <button type="button" className="btn-quiet mt-1" disabled={busy} onClick={() => onRetry(e.id)}>
                Retry sending to {e.to}
              </button>
            )}
          </li>
        ))}
      </ul>
    </div>
  );
}
