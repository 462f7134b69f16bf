import "server-only";
import type { NextRequest } from "next/server";
import type { User } from "lucia";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";
import { OWNER_SUMMARY_UNAVAILABLE } from "@/lib/owner/availability";
import { listAttachments, uploadAttachment } from "../attachments";
import { listEmails } from "../outbound-email";
import { loadCaseForOwner } from "../owner-case";
import { currentProposalForShop } from "../repair-proposals";
import { createShareLink, listShareLinks, ownerPagePath } from "../share-links";
import { readPhotoUpload } from "../upload-body";

// What the routes under /api/cases/[id] read and add beside the interview: each is the one call its
// route makes, the case checked first (404 for another shop's, 403 where the user may not work on it).

export async function caseAttachments({ user, caseId }: { user: User; caseId: number }) {
  await loadCaseForOwner({ user, caseId });
  return { attachments: await listAttachments({ shopId: user.shopId, caseId }) };
}

/** A photo as multipart/form-data; the case is checked before the body is read. */
export async function addCasePhoto({ user, caseId, req }: { user: User; caseId: number; req: NextRequest }) {
  await loadCaseForOwner({ user, caseId, forChange: true });
  const { bytes, fields } = await readPhotoUpload(req);
  return uploadAttachment({ user, caseId, bytes, fields });
}

export async function caseEmails({ user, caseId }: { user: User; caseId: number }) {
  await loadCaseForOwner({ user, caseId });
  return { emails: await listEmails({ shopId: user.shopId, caseId }) };
}

export async function caseProposal({ user, caseId }: { user: User; caseId: number }) {
  await loadCaseForOwner({ user, caseId });
  return { proposal: await currentProposalForShop({ shopId: user.shopId, caseId }) };
}

export async function caseShareLinks({ user, caseId }: { user: User; caseId: number }) {
  await loadCaseForOwner({ user, caseId });
  return { links: await listShareLinks({ shopId: user.shopId, caseId }) };
}

/** A new link to the owner page; its address is in this answer only (the token is stored hashed). */
export async function shareCase({
  user,
  caseId,
  expiresInDays,
}: {
  user: User;
  caseId: number;
  expiresInDays: number;
}) {
  const caseRow = await loadCaseForOwner({ user, caseId, forChange: true });
  if (!caseRow.available) throw new AppError("conflict:case", OWNER_SUMMARY_UNAVAILABLE);
  const link = await createShareLink({ user, caseId, expiresInDays });
  return {
    link: {
      id: link.id,
      url: `${env().APP_ORIGIN}${ownerPagePath(link.token)}`,
      expiresAt: link.expiresAt.toISOString(),
    },
  };
}
