"use client";

import { useRef, useState } from "react";
import {
  ATTACHMENT_KIND_LABELS,
  ATTACHMENT_KINDS,
  MAX_UPLOAD_BYTES,
  type AttachmentKind,
  type AttachmentView,
} from "@/lib/contracts/attachments";
import { removePhoto, updatePhoto, uploadPhoto } from "@/lib/queries/attachments";
import { useCaseAction } from "@/components/owner/use-case-action";
import { ConfirmDialog } from "@/components/ui/confirm-dialog";

/** Photos on a case: taken with the phone's camera or chosen from files; shared with the owner by choice. */
export function CasePhotos({
  caseId,
  mayAct,
  attachments,
}: {
  caseId: number;
  mayAct: boolean;
  attachments: AttachmentView[];
}) {
  const fileRef = useRef<HTMLInputElement>(null);
  const [kind, setKind] = useState<AttachmentKind>("gauges");
  const [caption, setCaption] = useState("");
  const [shareable, setShareable] = useState(false);
  const [localError, setLocalError] = useState<string | null>(null);
  const upload = useCaseAction(
    (file: File) => uploadPhoto(caseId, { file, kind, caption, shareable }),
    () => {
      setCaption("");
      if (fileRef.current) fileRef.current.value = "";
    },
  );
  const share = useCaseAction((a: { id: number; shareable: boolean }) =>
    updatePhoto(caseId, a.id, { shareable: a.shareable }),
  );
  const [removing, setRemoving] = useState<AttachmentView | null>(null);
  const remove = useCaseAction(
    (id: number) => removePhoto(caseId, id),
    () => setRemoving(null),
  );
  const error = localError ?? upload.error ?? share.error ?? remove.error;
  return (
    <section aria-labelledby="photos-heading" className="card space-y-3">
      <h2 id="photos-heading" className="text-lg font-bold">
        Photos
      </h2>
      {mayAct && (
        <form
          className="space-y-2"
          onSubmit={(e) => {
            e.preventDefault();
            const file = fileRef.current?.files?.[0];
            if (!file) return setLocalError("Take or choose a photo first.");
            if (file.size > MAX_UPLOAD_BYTES)
              return setLocalError("That photo is larger than 15 MB. Take it again at a lower size.");
            setLocalError(null);
            upload.mutate(file);
          }}
        >
          <div>
            <label htmlFor="photo-file" className="field-label">
              Photo
            </label>
            <input
              id="photo-file"
              ref={fileRef}
              type="file"
              accept="image/*"
              capture="environment"
              // The picker's own button is the tap target: as tall as the other buttons, for gloved hands.
              className="block w-full text-base file:mr-3 file:min-h-glove file:rounded-card file:border-2 file:border-paper-line file:bg-paper file:px-4 file:font-bold file:text-ink"
            />
          </div>
          <div>
            <label htmlFor="photo-kind" className="field-label">
              What it shows
            </label>
            <select
              id="photo-kind"
              className="field-input"
              value={kind}
              onChange={(e) => setKind(e.target.value as AttachmentKind)}
            >
              {ATTACHMENT_KINDS.map((k) => (
                <option key={k} value={k}>
                  {ATTACHMENT_KIND_LABELS[k]}
                </option>
              ))}
            </select>
          </div>
          <div>
            <label htmlFor="photo-caption" className="field-label">
              Caption (the owner sees it if shared)
            </label>
            <input
              id="photo-caption"
              className="field-input"
              maxLength={200}
              value={caption}
              onChange={(e) => setCaption(e.target.value)}
            />
          </div>
          <label className="flex min-h-touch items-center gap-2">
            <input
              type="checkbox"
              className="h-6 w-6 shrink-0"
              checked={shareable}
              onChange={(e) => setShareable(e.target.checked)}
            />
            Show on the owner&apos;s page
          </label>
          <button type="submit" className="btn-primary w-full" disabled={upload.isPending}>
            {upload.isPending ? "Uploading…" : "Add the photo"}
          </button>
        </form>
      )}
      {error && (
        <p role="alert" className="field-error">
          {error}
        </p>
      )}
      {attachments.length === 0 ? (
        <p>No photos yet.</p>
      ) : (
        <ul className="grid grid-cols-2 gap-3" data-testid="case-photos">
          {attachments.map((a) => (
            <li key={a.id} className="space-y-1">
              <a href={`/api/cases/${caseId}/attachments/${a.id}`} target="_blank" rel="noreferrer">
                {/* eslint-disable-next-line @next/next/no-img-element -- our own resized thumbnail */}
                <img
                  src={`/api/cases/${caseId}/attachments/${a.id}?size=thumb`}
                  alt={a.caption || ATTACHMENT_KIND_LABELS[a.kind]}
                  className="h-auto w-full rounded-card border border-paper-line"
                />
              </a>
              <p className="text-sm">
                {ATTACHMENT_KIND_LABELS[a.kind]}
                {a.caption ? `: ${a.caption}` : ""} · {a.uploadedBy}
              </p>
              {mayAct && (
                <>
                  <label className="flex min-h-touch items-center gap-2 text-sm">
                    <input
                      type="checkbox"
                      className="h-6 w-6 shrink-0"
                      checked={a.shareable}
                      disabled={share.isPending}
                      onChange={(e) => share.mutate({ id: a.id, shareable: e.target.checked })}
                    />
                    Owner sees photo {a.id}
                  </label>
                  <button
                    type="button"
                    className="btn-quiet text-sm"
                    disabled={remove.isPending}
                    onClick={() => setRemoving(a)}
                  >
                    Remove photo {a.id}…
                  </button>
                </>
              )}
            </li>
          ))}
        </ul>
      )}
      <ConfirmDialog
        open={removing !== null}
        title={removing ? `Remove photo ${removing.id}?` : "Remove a photo?"}
        confirmLabel="Remove the photo"
        danger
        busy={remove.isPending}
        error={removing ? remove.error : null}
        onConfirm={() => removing && remove.mutate(removing.id)}
        onCancel={() => setRemoving(null)}
      >
        {removing && (
          <p>
            {ATTACHMENT_KIND_LABELS[removing.kind]}
            {removing.caption ? `: ${removing.caption}` : ""}. It leaves the case
            {removing.shareable ? " and the owner's page" : ""}, and cannot be brought back; take it again if
            it is needed.
          </p>
        )}
      </ConfirmDialog>
    </section>
  );
}
