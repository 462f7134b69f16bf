import "server-only";
import type { User } from "lucia";
import { mayDo } from "@/lib/cases/rules";
import type { AttachmentView } from "@/lib/contracts/attachments";
import type { OutboundEmailView } from "@/lib/contracts/emails";
import type { ShareLinkView, ShopProposalView } from "@/lib/contracts/owner-summary";
import { ownerCause } from "@/lib/owner/summary";
import { OWNER_CAUSES } from "@/lib/owner/causes";
import { ownerFactsFromCase } from "@/lib/owner/case-facts";
import type { RepairId } from "@/lib/repairs/catalog";
import { listAttachments } from "./attachments";
import { loadOwnerCase } from "./owner-case";
import { listEmails } from "./outbound-email";
import { currentProposalForShop } from "./repair-proposals";
import { listShareLinks } from "./share-links";

/** What the case page's owner and photo panels show, loaded once by the page. */
export interface OwnerPanelData {
  caseId: number;
  available: boolean;
  mayAct: boolean;
  customerEmail: string | null;
  links: ShareLinkView[];
  emails: OutboundEmailView[];
  proposal: ShopProposalView | null;
  suggestedRepairs: RepairId[];
  attachments: AttachmentView[];
}

export async function ownerPanelData({
  user,
  caseId,
}: {
  user: User;
  caseId: number;
}): Promise<OwnerPanelData> {
  const row = await loadOwnerCase({ shopId: user.shopId, caseId });
  const shopId = user.shopId;
  const [links, emails, proposal, attachments] = await Promise.all([
    listShareLinks({ shopId, caseId }),
    listEmails({ shopId, caseId }),
    currentProposalForShop({ shopId, caseId }),
    listAttachments({ shopId, caseId }),
  ]);
  const cause = ownerCause(row.conclusionCause, row.findings);
  const facts = ownerFactsFromCase({ units: row.units, answersRecord: row.answers, serviceRecord: null });
  return {
    caseId,
    available: row.available,
    mayAct: mayDo("work_on", user, row),
    customerEmail: row.customerEmail,
    links,
    emails,
    proposal,
    suggestedRepairs: cause ? OWNER_CAUSES[cause].repairs(facts) : [],
    attachments,
  };
}
