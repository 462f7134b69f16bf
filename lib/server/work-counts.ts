import "server-only";
import { Op, fn, col, literal } from "sequelize";
import type { User } from "lucia";
import { getModels } from "@/models";
import { can } from "@/lib/auth/roles";
import type { SignOffQueue, WorkCounts } from "@/lib/contracts/work-counts";

/** One grouped count over the shop's cases (index service_case_shop_id_status) for the home screen. */
export async function workCounts({
  user,
}: {
  user: Pick<User, "id" | "shopId" | "role">;
}): Promise<WorkCounts> {
  const { Case } = getModels();
  const me = Case.sequelize!.escape(user.id);
  const rows = (await Case.findAll({
    attributes: [
      "status",
      [literal(`technician_id = ${me}`), "mine"],
      // A conclusion this person saved or submitted is not theirs to sign off (lib/cases/rules.ts).
      [literal(`JSON_CONTAINS(COALESCE(conclusion_writer_ids, '[]'), JSON_QUOTE(${me}))`), "wrote"],
      [fn("COUNT", col("id")), "n"],
    ],
    where: { shopId: user.shopId, status: { [Op.ne]: "closed" } },
    group: ["status", "mine", "wrote"],
    raw: true,
  })) as unknown as { status: string; mine: number | string; wrote: number | string; n: number | string }[];
  const count = (status: string, mine: boolean, wrote?: boolean) =>
    rows
      .filter(
        (r) =>
          r.status === status &&
          Boolean(Number(r.mine)) === mine &&
          (wrote === undefined || Boolean(Number(r.wrote)) === wrote),
      )
      .reduce((sum, r) => sum + Number(r.n), 0);
  return {
    myDrafts: count("draft", true),
    sentBackToMe: count("sent_back", true),
    waitingForMySignOff: can(user.role, "signoff:review") ? count("awaiting_signoff", false, false) : null,
    shopOpen: rows.reduce((sum, r) => sum + Number(r.n), 0),
  };
}

const QUEUE_PAGE = 50;

/** The cases waiting for a second person's sign-off, oldest submission first. */
export async function signOffQueue({ shopId }: { shopId: number }): Promise<SignOffQueue> {
  const { Case, Vehicle, User: UserModel } = getModels();
  const where = { shopId, status: "awaiting_signoff" as const };
  const [total, rows] = await Promise.all([
    Case.count({ where }),
    Case.findAll({
      where,
      attributes: ["id", "complaint", "submittedAt", "updatedAt"],
      include: [
        { model: Vehicle, attributes: ["year", "make", "model"] },
        { model: UserModel, as: "technician", attributes: ["name"] },
      ],
      order: [
        [literal("COALESCE(submitted_at, `Case`.updated_at)"), "ASC"],
        ["id", "ASC"],
      ],
      limit: QUEUE_PAGE,
    }),
  ]);
  return {
    total,
    items: rows.map((row) => {
      const c = row.get({ plain: true }) as unknown as {
        id: number;
        complaint: string;
        submittedAt: Date | null;
        updatedAt: Date;
        Vehicle: { year: number; make: string; model: string } | null;
        technician: { name: string };
      };
      return {
        id: c.id,
        complaint: c.complaint,
        vehicle: c.Vehicle ? `${c.Vehicle.year} ${c.Vehicle.make} ${c.Vehicle.model}` : null,
        technician: c.technician.name,
        submittedAt: (c.submittedAt ?? c.updatedAt).toISOString(),
      };
    }),
  };
}
