import { QueryTypes } from "sequelize";
import type { User } from "lucia";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { closeSequelize } from "@/lib/db/sequelize";
import { getModels } from "@/models";
import { casebookSearchQuerySchema, type CasebookSearchQuery } from "@/lib/contracts/casebook";
import { searchCasebook, pageSql, countSql, resolveSort } from "@/lib/server/casebook/search";
import { casebookFacets } from "@/lib/server/casebook/facets";
import { casebookCsvExport } from "@/lib/server/casebook/export";
import { casebookWhere } from "@/lib/server/casebook/filters";
import { nearestSql, similarCases } from "@/lib/server/casebook/similar";
import { recordCaseOutcome } from "@/lib/server/casebook/outcome";
import { refreshCasebookEntry } from "@/lib/db/casebook-refresh";
import { caseFeaturesFrom } from "@/lib/casebook/features";
import { MIN_INDEXED_WORD_CHARS, shopTermPrefix } from "@/lib/casebook/words";
import { fillCasebookDatabase } from "@/bench/casebook-data";
import { createShopWithCase } from "./fixtures";
import { uniqueName } from "./helpers";

afterAll(() => closeSequelize());

const ids = { warmAgain: 0, fanRelay: 0, sierra: 0, malibu: 0, focus: 0, tacoma: 0 };
let harbourline = 0;
let ridgeback = 0;

beforeAll(async () => {
  const { Shop, Case } = getModels();
  harbourline = (await Shop.findOne({ where: { name: "Harbourline Auto Climate" }, raw: true }))!.id;
  ridgeback = (await Shop.findOne({ where: { name: "Ridgeback Cooling Works" }, raw: true }))!.id;
  const find = async (shopId: number, phrase: string) => {
    const rows = await Case.findAll({ where: { shopId }, attributes: ["id", "complaint"], raw: true });
    const hit = rows.find((r) => r.complaint.includes(phrase));
    if (!hit) throw new Error(`no seeded case with "${phrase}"`);
    return hit.id;
  };
  ids.warmAgain = await find(harbourline, "delivery route");
  ids.fanRelay = await find(harbourline, "Courier van blows warm");
  ids.sierra = await find(harbourline, "burning smell from the grille");
  ids.malibu = await find(harbourline, "lukewarm air in the car park");
  ids.focus = await find(harbourline, "only cool at highway speed");
  ids.tacoma = await find(ridgeback, "ranch road");
});

const search = (shopId: number, query: Record<string, string | undefined>) =>
  searchCasebook({ shopId, query: casebookSearchQuerySchema.parse(query) as CasebookSearchQuery });
const caseIds = (r: { rows: { caseId: number }[] }) => r.rows.map((row) => row.caseId);

describe("the casebook search", () => {
  it("finds a case by a word of its complaint, ranked by relevance", async () => {
    const result = await search(harbourline, { q: "delivery" });
    expect(result.textMode).toBe("fulltext");
    expect(result.sort).toBe("relevance");
    expect(caseIds(result)).toEqual([ids.warmAgain]);
    expect(result.total).toBe(1);
  });

  it("finds cases by a symptom, by the leading suspect and by the confirmed cause", async () => {
    const bySymptom = await search(harbourline, { symptoms: "condenser_fan_not_running" });
    expect(new Set(caseIds(bySymptom))).toEqual(new Set([ids.warmAgain, ids.fanRelay]));
    const byCause = await search(harbourline, { cause: "condenser_airflow" });
    expect(new Set(caseIds(byCause))).toEqual(new Set([ids.fanRelay, ids.sierra, ids.malibu]));
    expect(byCause.rows.every((r) => r.confirmedCauses.includes("condenser_airflow"))).toBe(true);
    const both = await search(harbourline, {
      cause: "condenser_airflow",
      symptoms: "condenser_fan_not_running",
    });
    expect(caseIds(both)).toEqual([ids.fanRelay]);
  });

  it("searches the seniors' notes, the conclusion and the confirmed repair as well as the complaint", async () => {
    // Words that appear only in a sign-off comment, a conclusion and a repair.
    const senior = await search(harbourline, { q: "radiator static" });
    expect(caseIds(senior).length).toBeGreaterThan(0);
    const repair = await search(harbourline, { q: "relay" });
    expect(caseIds(repair)).toContain(ids.fanRelay);
    const conclusion = await search(harbourline, { q: "flattened" });
    expect(caseIds(conclusion)).toEqual([ids.malibu]);
  });

  it("finds short words through the index and stopwords alone by a whole-word pattern", async () => {
    const models = getModels();
    const { shop, serviceCase } = await createShopWithCase(models, "AC light flashes, no cold air");
    const other = await models.Case.create({
      shopId: shop.id,
      technicianId: serviceCase.technicianId,
      vehicleId: serviceCase.vehicleId,
      customerId: serviceCase.customerId,
      complaint: "Vacuum would not hold after the repair",
    });
    await refreshCasebookEntry({ shopId: shop.id, caseId: serviceCase.id });
    await refreshCasebookEntry({ shopId: shop.id, caseId: other.id });
    const [setting] = await models.sequelize.query<{ size: number }>(
      "SELECT @@innodb_ft_min_token_size AS size",
      { type: QueryTypes.SELECT },
    );
    // A one-letter word with the shop's prefix is still longer than the server's minimum token.
    expect(Number(setting?.size)).toBe(MIN_INDEXED_WORD_CHARS);
    expect(shopTermPrefix(shop.id).length + 1).toBeGreaterThan(Number(setting?.size));
    const short = await search(shop.id, { q: "ac" });
    expect(short.textMode).toBe("fulltext");
    expect(caseIds(short)).toEqual([serviceCase.id]); // "vacuum" holds "ac" but not as a word
    const mixed = await search(shop.id, { q: "ac light" });
    expect(mixed.textMode).toBe("fulltext");
    expect(caseIds(mixed)).toEqual([serviceCase.id]);
    // Each short word is required: "ac" with a word only the other case has finds neither.
    expect(caseIds(await search(shop.id, { q: "ac vacuum" }))).toEqual([]);
    const stop = await search(shop.id, { q: "the" });
    expect(stop.textMode).toBe("pattern");
    expect(caseIds(stop)).toEqual([other.id]);
  });

  it("filters by make, model year, technician, status, dates and comeback, and pages with a count", async () => {
    const transit = await search(harbourline, { make: "Ford", model: "Transit" });
    expect(new Set(caseIds(transit))).toEqual(new Set([ids.warmAgain, ids.fanRelay]));
    const years = await search(harbourline, { yearFrom: "2016", yearTo: "2016" });
    expect(caseIds(years)).toContain(ids.sierra);
    expect(years.rows.every((r) => r.vehicle?.startsWith("2016 "))).toBe(true);
    const closed = await search(harbourline, { status: "closed", sort: "opened_at", dir: "asc" });
    expect(caseIds(closed).slice(0, 2)).toEqual([ids.fanRelay, ids.sierra]);
    const comebacks = await search(harbourline, { comeback: "1" });
    expect(new Set(caseIds(comebacks))).toEqual(new Set([ids.warmAgain, ids.fanRelay]));
    const inShop = await getModels().Case.count({ where: { shopId: harbourline } });
    const all = await search(harbourline, { pageSize: "100" });
    expect(all.total).toBe(inShop);
    expect(all.rows).toHaveLength(inShop);
    const first = await search(harbourline, { pageSize: "10", sort: "opened_at", dir: "asc" });
    const past = await search(harbourline, { pageSize: "10", page: "9" });
    expect(first.rows.map((r) => r.openedAt)).toEqual([...first.rows.map((r) => r.openedAt)].sort());
    expect(past.rows).toEqual([]);
    expect(past.total).toBe(inShop); // a page past the end still says how many there are
    const today = new Date().toISOString().slice(0, 10);
    const lastWeek = new Date(Date.now() - 7 * 86_400_000).toISOString().slice(0, 10);
    const recent = await search(harbourline, { from: lastWeek, to: today });
    expect(caseIds(recent)).toContain(ids.warmAgain);
    expect(caseIds(recent)).not.toContain(ids.sierra);
  });

  it("never shows another shop's case in a search, a facet count or an export", async () => {
    // The Ridgeback pickup has the same symptoms, cause and words ("warm", "idle") as Harbourline's cases.
    for (const query of [
      { q: "warm idle fan" },
      { cause: "condenser_airflow" },
      { symptoms: "worse_at_idle" },
    ]) {
      const h = await search(harbourline, query);
      expect(caseIds(h)).not.toContain(ids.tacoma);
      const r = await search(ridgeback, query);
      expect(caseIds(r)).toContain(ids.tacoma);
      expect(r.rows.every((row) => row.caseId === ids.tacoma || !caseIds(h).includes(row.caseId))).toBe(true);
    }
    const facets = await casebookFacets({
      shopId: harbourline,
      filters: casebookSearchQuerySchema.parse({}),
    });
    expect(facets.facets.cause.find((c) => c.value === "condenser_airflow")?.count).toBe(3);
    expect(facets.facets.model.map((m) => m.value)).not.toContain("Tacoma"); // Ridgeback's pickup
    const ridgebackFacets = await casebookFacets({
      shopId: ridgeback,
      filters: casebookSearchQuerySchema.parse({}),
    });
    expect(ridgebackFacets.facets.cause).toEqual([{ value: "condenser_airflow", count: 1 }]);
    expect(ridgebackFacets.total).toBe(await getModels().Case.count({ where: { shopId: ridgeback } }));

    const { stream, total } = await casebookCsvExport({
      shopId: harbourline,
      query: casebookSearchQuerySchema.parse({ q: "warm" }),
    });
    const bytes = new Uint8Array(await new Response(stream).arrayBuffer());
    expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]); // a byte-order mark for spreadsheets
    const csv = new TextDecoder().decode(bytes);
    const lines = csv.trim().split("\r\n");
    expect(lines[0]).toMatch(/^case,opened_utc,/);
    expect(lines).toHaveLength(total + 1);
    expect(csv).not.toContain("ranch road");
    expect(lines.slice(1).map((l) => Number(l.split(",")[0]))).not.toContain(ids.tacoma);
  });

  it("counts each facet over the other filters", async () => {
    const filters = casebookSearchQuerySchema.parse({ make: "Ford" });
    const { facets, total } = await casebookFacets({ shopId: harbourline, filters });
    const fordCount = (await search(harbourline, { make: "Ford" })).total;
    expect(total).toBe(fordCount);
    // The make facet ignores its own filter, so the other makes stay in view.
    expect(facets.make.map((m) => m.value)).toEqual(expect.arrayContaining(["Ford", "GMC", "Chevrolet"]));
    expect(facets.status.reduce((sum, s) => sum + s.count, 0)).toBe(fordCount);
    expect(facets.technician.every((t) => t.label && t.label.length > 0)).toBe(true);
  });
});

describe("similar cases", () => {
  it("lists the shop's nearest closed cases of the same system with what they turned out to be", async () => {
    const result = await similarCases({ shopId: harbourline, caseId: ids.warmAgain, k: 10 });
    expect(result.unavailable).toBeNull();
    expect(result.neighbours[0]?.caseId).toBe(ids.fanRelay); // the same van, the same readings
    expect(result.neighbours[0]?.distance).toBeCloseTo(0, 3);
    expect(result.neighbours[0]?.confirmedCauses).toEqual(["condenser_airflow"]);
    expect(result.neighbours[0]?.repairIds).toEqual(["condenser_fan_repair"]);
    const distances = result.neighbours.map((n) => n.distance);
    expect(distances).toEqual([...distances].sort((a, b) => a - b));
    // Closed R-134a orifice-tube cases of Harbourline only: never Ridgeback's pickup with the same readings.
    expect(new Set(result.neighbours.map((n) => n.caseId))).toEqual(
      new Set([ids.fanRelay, ids.sierra, ids.malibu, ids.focus]),
    );
    expect(result.summary).toEqual({ cause: "condenser_airflow", count: 3, of: 4 });
  });

  it("never shows another shop's case, even one with the same readings", async () => {
    const fromRidgeback = await similarCases({ shopId: ridgeback, caseId: ids.tacoma, k: 10 });
    expect(fromRidgeback.neighbours.map((n) => n.caseId)).not.toContain(ids.fanRelay);
    expect(fromRidgeback.neighbours.map((n) => n.caseId)).not.toContain(ids.warmAgain);
    await expect(similarCases({ shopId: ridgeback, caseId: ids.warmAgain })).rejects.toMatchObject({
      status: 404,
    });
  });

  it("stores the readings a submitted case is compared on", async () => {
    const { CaseFeatures, Case } = getModels();
    const stored = await CaseFeatures.findOne({ where: { caseId: ids.sierra }, raw: true });
    const row = await Case.findByPk(ids.sierra, { raw: true });
    expect(stored).toMatchObject({
      shopId: harbourline,
      refrigerant: "R-134a",
      meteringDevice: "orifice_tube",
    });
    expect(Boolean(stored?.closed)).toBe(true);
    const expected = caseFeaturesFrom(row?.findings);
    expect(stored?.condensingC).toBeCloseTo(expected.condensingC ?? Number.NaN, 1);
    expect(stored?.ambientC).toBe(33);
  });
});

describe("comebacks", () => {
  it("flags both the returning case and the case it came back after", async () => {
    const { CasebookEntry } = getModels();
    const back = await CasebookEntry.findByPk(ids.warmAgain, { raw: true });
    const before = await CasebookEntry.findByPk(ids.fanRelay, { raw: true });
    expect(back).toMatchObject({ comebackOfCaseId: ids.fanRelay });
    expect(before).toMatchObject({ cameBackCaseId: ids.warmAgain });
    expect(Boolean(back?.comeback) && Boolean(before?.comeback)).toBe(true);
    // The Sierra's case was closed and nothing came back.
    const sierra = await CasebookEntry.findByPk(ids.sierra, { raw: true });
    expect(Boolean(sierra?.comeback)).toBe(false);
  });

  it("follows the shop's window: a shorter window leaves an older return unflagged", async () => {
    const models = getModels();
    const { shop, serviceCase, technician } = await createShopWithCase(models, "Warm again");
    await shop.update({ comebackWindowDays: 30 });
    const dayMs = 86_400_000;
    await serviceCase.update({ status: "closed", closedAt: new Date(Date.now() - 45 * dayMs) });
    const second = await models.Case.create({
      shopId: shop.id,
      technicianId: technician.id,
      vehicleId: serviceCase.vehicleId,
      customerId: serviceCase.customerId,
      complaint: "Warm once more",
    });
    await refreshCasebookEntry({ shopId: shop.id, caseId: second.id });
    expect((await models.CasebookEntry.findByPk(second.id, { raw: true }))?.comebackOfCaseId).toBeNull();
    await shop.update({ comebackWindowDays: 90 });
    await refreshCasebookEntry({ shopId: shop.id, caseId: second.id });
    expect((await models.CasebookEntry.findByPk(second.id, { raw: true }))?.comebackOfCaseId).toBe(
      serviceCase.id,
    );
  });
});

describe("recording a case's outcome", () => {
  const userOf = (u: { id: string; shopId: number; role: string; name: string; email: string }) =>
    ({ id: u.id, shopId: u.shopId, role: u.role, name: u.name, email: u.email }) as unknown as User;

  it("writes the confirmed causes, repairs and note, closes the case and indexes it in one go", async () => {
    const models = getModels();
    const { shop, serviceCase, technician } = await createShopWithCase(models, "Hisses under the dash");
    const user = userOf({ ...technician.get({ plain: true }), shopId: shop.id });
    await expect(
      recordCaseOutcome({ user, caseId: serviceCase.id, causes: ["moisture"], repairIds: [] }),
    ).rejects.toMatchObject({ status: 409 }); // still a draft
    await serviceCase.update({ status: "signed_off" });
    const done = await recordCaseOutcome({
      user,
      caseId: serviceCase.id,
      causes: ["moisture", "metering_restriction"],
      repairIds: ["replace_drier", "replace_orifice_tube"],
      note: "Ice crystals at the orifice tube screen.",
    });
    expect(done.caseId).toBe(serviceCase.id);
    const row = await models.Case.findByPk(serviceCase.id, { raw: true });
    expect(row).toMatchObject({ status: "closed", repairNote: "Ice crystals at the orifice tube screen." });
    expect(row?.closedAt).toBeInstanceOf(Date);
    const causes = await models.CaseConfirmedCause.findAll({ where: { caseId: serviceCase.id }, raw: true });
    expect(causes.map((c) => c.cause).sort()).toEqual(["metering_restriction", "moisture"]);
    const entry = await models.CasebookEntry.findByPk(serviceCase.id, { raw: true });
    expect(entry).toMatchObject({ status: "closed", outcome: "moisture" });
    const found = await search(shop.id, { q: "crystals", cause: "metering_restriction" });
    expect(caseIds(found)).toEqual([serviceCase.id]);
    const audit = await models.AuditEvent.findOne({
      where: { shopId: shop.id, entity: "case", entityId: String(serviceCase.id), action: "close" },
      raw: true,
    });
    expect(audit).not.toBeNull();

    // Recording again replaces the outcome.
    await recordCaseOutcome({ user, caseId: serviceCase.id, causes: ["none_found"], repairIds: [] });
    const again = await models.CaseConfirmedCause.findAll({ where: { caseId: serviceCase.id }, raw: true });
    expect(again.map((c) => c.cause)).toEqual(["none_found"]);
  });

  it("answers 404 for another shop's case and changes nothing there", async () => {
    const models = getModels();
    const a = await createShopWithCase(models);
    const b = await createShopWithCase(models);
    await b.serviceCase.update({ status: "signed_off" });
    const user = userOf({ ...a.technician.get({ plain: true }), shopId: a.shop.id });
    await expect(
      recordCaseOutcome({ user, caseId: b.serviceCase.id, causes: ["moisture"], repairIds: [] }),
    ).rejects.toMatchObject({ status: 404 });
    expect(await models.CaseConfirmedCause.count({ where: { caseId: b.serviceCase.id } })).toBe(0);
  });
});

describe("EXPLAIN", () => {
  type Plan = {
    table: string;
    type: string;
    key: string | null;
    possible_keys: string | null;
    Extra: string;
  };
  const explain = async (sql: string, replacements: Record<string, unknown>) =>
    getModels().sequelize.query<Plan>(`EXPLAIN ${sql}`, { replacements, type: QueryTypes.SELECT });
  // A plan says something only at a realistic size: on a dozen rows any optimizer scans the table.
  let bigShop = 0;
  beforeAll(async () => {
    const { shopIds } = await fillCasebookDatabase(getModels().sequelize, {
      shops: 2,
      cases: 4000,
      passwordHash: "not-a-real-hash",
      namePrefix: uniqueName("Explain shop"),
    });
    bigShop = shopIds[0]!;
  }, 120_000);

  const planFor = async (input: Record<string, string>) => {
    const query = casebookSearchQuerySchema.parse(input) as CasebookSearchQuery;
    const where = casebookWhere(bigShop, query);
    const { sort, dir } = resolveSort(query, where);
    const plans = [];
    for (const sql of [pageSql(where, sort, dir), countSql(where)]) {
      const plan = await explain(sql, { ...where.replacements, limit: 25, offset: 0 });
      plans.push({ plan, entry: plan.find((p) => p.table === "e") });
    }
    return plans;
  };

  it("reads a search with words and two facets from the full-text index of the shop's own terms", async () => {
    for (const { plan, entry } of await planFor({
      q: "warm idle",
      refrigerant: "R-134a",
      device: "orifice_tube",
    })) {
      expect(entry?.type, JSON.stringify(plan)).toBe("fulltext");
      expect(entry?.key, JSON.stringify(plan)).toBe("casebook_entry_terms");
    }
    // The terms carry the shop: the index never holds a word on its own, so another shop's
    // cases cannot match.
    const entry = await getModels().CasebookEntry.findByPk(ids.warmAgain, { raw: true });
    expect(entry?.searchTerms.split(" ").every((t) => t.startsWith(shopTermPrefix(harbourline)))).toBe(true);
    expect(shopTermPrefix(harbourline)).not.toBe(shopTermPrefix(ridgeback));
    expect(shopTermPrefix(bigShop)).not.toBe(shopTermPrefix(harbourline));
  });

  it("reads a search with a short word from the same full-text index", async () => {
    for (const { plan, entry } of await planFor({ q: "ac warm", status: "closed" })) {
      expect(entry?.type, JSON.stringify(plan)).toBe("fulltext");
      expect(entry?.key, JSON.stringify(plan)).toBe("casebook_entry_terms");
    }
  });

  it("walks a shop index when a search has facets and no words", async () => {
    for (const { plan, entry } of await planFor({ refrigerant: "R-134a", device: "orifice_tube" })) {
      expect(entry?.type, JSON.stringify(plan)).not.toBe("ALL");
      expect(entry?.key, JSON.stringify(plan)).toMatch(/^casebook_entry_shop_/);
    }
  });

  it("reads the nearest closed cases from case_features_nearest", async () => {
    const { Case } = getModels();
    const row = await Case.findByPk(ids.warmAgain, { raw: true });
    const features = caseFeaturesFrom(row?.findings);
    for (const bounded of [true, false]) {
      const { sql, replacements } = nearestSql(features, bounded);
      const plan = await explain(sql, {
        ...replacements,
        shopId: harbourline,
        caseId: ids.warmAgain,
        refrigerant: "R-134a",
        device: "orifice_tube",
        k: 10,
      });
      expect(plan[0]?.key, JSON.stringify(plan)).toBe("case_features_nearest");
      expect(plan[0]?.type, JSON.stringify(plan)).toMatch(/^(ref|range)$/);
      expect(plan[0]?.Extra, JSON.stringify(plan)).toContain("Using index");
    }
  });
});
