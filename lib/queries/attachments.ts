import type { AttachmentPatchInput, AttachmentView } from "@/lib/contracts/attachments";
import { apiFetch, ApiError } from "./api-fetch";

/** Sends a photo as multipart/form-data; the server checks its bytes and re-encodes it. */
export async function uploadPhoto(
  caseId: number,
  photo: { file: File; kind: string; caption: string; shareable: boolean },
): Promise<{ attachment: AttachmentView }> {
  const form = new FormData();
  form.set("file", photo.file);
  form.set("kind", photo.kind);
  form.set("caption", photo.caption);
  form.set("shareable", String(photo.shareable));
  const response = await fetch(`/api/cases/${caseId}/attachments`, {
    method: "POST",
    body: form,
    credentials: "same-origin",
  });
  const data = (await response.json().catch(() => null)) as
    ({ attachment: AttachmentView } & { error?: { code: string; message: string } }) | null;
  if (!response.ok || !data)
    throw new ApiError(
      data?.error?.message ?? `The server answered ${response.status}.`,
      response.status,
      data?.error?.code ?? "unknown",
    );
  return data;
}

export function updatePhoto(caseId: number, attachmentId: number, body: AttachmentPatchInput) {
  return apiFetch<{ attachment: AttachmentView }>(`/api/cases/${caseId}/attachments/${attachmentId}`, {
    method: "PATCH",
    body,
  });
}

export function removePhoto(caseId: number, attachmentId: number) {
  return apiFetch<{ removed: boolean }>(`/api/cases/${caseId}/attachments/${attachmentId}`, {
    method: "DELETE",
  });
}
