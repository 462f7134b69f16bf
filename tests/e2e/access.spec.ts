import { expect, test, type APIRequestContext } from "@playwright/test";
import { apiClient, BASE_URL, signedInClient } from "./pages/api-client";
import { DEMO_USERS, type DemoRole } from "./pages/sign-in-page";
import { caseIdByVehicle, markSignedOff, phonePhoto, tokenOf } from "./pages/owner-fixtures";

// The role × route table: for each API route (and the public files Next.js serves from app/), each role,
// no session and another shop's owner.
type Who = DemoRole | "anonymous" | "otherShopOwner";
const WHO: Who[] = ["anonymous", "owner", "senior", "technician", "apprentice", "otherShopOwner"];

const clients = new Map<Who, APIRequestContext>();
let harbourlineCaseId = 0;
let ridgebackUserId = "";
let harbourlineTechId = "";
let harbourlineVehicleId = 0;
let harbourlineCylinderId = 0;
// The owner summary: a live Harbourline link and photo, and a live link to a Ridgeback case.
let sharedCaseId = 0;
let harbourlineToken = "";
let harbourlinePhotoId = 0;
let harbourlineProposalId = 0;
let ridgebackToken = "";
const MALFORMED_TOKEN = "not-a-token";
let harbourlineInvitationId = 0;

test.beforeAll(async () => {
  clients.set("anonymous", await apiClient());
  for (const role of Object.keys(DEMO_USERS) as DemoRole[])
    clients.set(role, await signedInClient(DEMO_USERS[role].email));
  clients.set("otherShopOwner", await signedInClient("owner@ridgeback.test"));
  const cases = await (await clients.get("owner")!.get("/api/cases")).json();
  harbourlineCaseId = cases.cases[0].id;
  const ridgebackUsers = await (await clients.get("otherShopOwner")!.get("/api/users")).json();
  ridgebackUserId = ridgebackUsers.users[0].id;
  const harbourlineUsers = await (await clients.get("owner")!.get("/api/users")).json();
  harbourlineTechId = harbourlineUsers.users.find(
    (u: { email: string }) => u.email === DEMO_USERS.technician.email,
  ).id;
  const vehicles = await (await clients.get("owner")!.get("/api/vehicles")).json();
  harbourlineVehicleId = vehicles.vehicles[0].vehicleId;
  const cylinders = await (await clients.get("owner")!.get("/api/cylinders")).json();
  harbourlineCylinderId = cylinders.cylinders.find((c: { retired: boolean }) => !c.retired).id;

  const tech = clients.get("technician")!;
  sharedCaseId = await caseIdByVehicle(tech, "CX-5");
  const made = await (await tech.post(`/api/cases/${sharedCaseId}/share-links`, { data: {} })).json();
  harbourlineToken = tokenOf(made.link.url);
  const upload = await tech.post(`/api/cases/${sharedCaseId}/attachments`, {
    multipart: {
      file: { name: "gauges.jpg", mimeType: "image/jpeg", buffer: await phonePhoto() },
      shareable: "true",
      caption: "Access-table photo",
    },
  });
  harbourlinePhotoId = (await upload.json()).attachment.id;
  const proposal = await (await tech.get(`/api/cases/${sharedCaseId}/proposal`)).json();
  harbourlineProposalId = proposal.proposal.id;
  const ridgeback = clients.get("otherShopOwner")!;
  const ridgebackCaseId = (await (await ridgeback.get("/api/cases")).json()).cases[0].id;
  await markSignedOff(ridgebackCaseId);
  const ridgebackLink = await (
    await ridgeback.post(`/api/cases/${ridgebackCaseId}/share-links`, { data: {} })
  ).json();
  ridgebackToken = tokenOf(ridgebackLink.link.url);
  const invited = await clients.get("owner")!.post("/api/invitations", {
    data: { email: "access-table@harbourline.test", name: "Access Table", role: "apprentice" },
  });
  harbourlineInvitationId = (await invited.json()).invitation.id;
});

test.afterAll(async () => {
  for (const client of clients.values()) await client.dispose();
});

type Expectation = Record<Who, number>;
/**
 * A row names the route as "METHOD /path (what is sent)", or "PAGE /path" for a page;
 * tests/unit/route-inventory.test.ts fails when a route, page or server action of app/ has no row.
 */
const table: {
  name: string;
  call: (c: APIRequestContext) => Promise<{ status(): number }>;
  /** For a row that must not use the shared clients (signing out would end their sessions). */
  callAs?: (who: Who) => Promise<number>;
  expect: Expectation;
}[] = [
  {
    name: "GET /manifest.webmanifest (public, no redirect)",
    call: (c) => c.get("/manifest.webmanifest", { maxRedirects: 0 }),
    expect: {
      anonymous: 200,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /icon.svg (public, no redirect)",
    call: (c) => c.get("/icon.svg", { maxRedirects: 0 }),
    expect: {
      anonymous: 200,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /apple-icon.png (public, no redirect)",
    call: (c) => c.get("/apple-icon.png", { maxRedirects: 0 }),
    expect: {
      anonymous: 200,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /favicon.ico (public, no redirect)",
    call: (c) => c.get("/favicon.ico", { maxRedirects: 0 }),
    expect: {
      anonymous: 200,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /api/health",
    call: (c) => c.get("/api/health"),
    expect: {
      anonymous: 200,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    // A page, not an API route: public, so no role is sent to the sign-in page.
    name: "PAGE /credits",
    call: (c) => c.get("/credits", { maxRedirects: 0 }),
    expect: {
      anonymous: 200,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /api/me",
    call: (c) => c.get("/api/me"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /api/me/profile",
    call: (c) => c.get("/api/me/profile"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    // Each person sets only their own units; this body puts back the shop's, which every demo user has.
    name: "PUT /api/me/profile",
    call: (c) =>
      c.put("/api/me/profile", {
        data: {
          system: null,
          pressure: null,
          temperature: null,
          mass: null,
          volume: null,
          vacuum: null,
          locale: null,
        },
      }),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "PUT /api/me/profile (malformed)",
    call: (c) => c.put("/api/me/profile", { data: { system: "cubits", locale: 7 } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 400,
      otherShopOwner: 400,
    },
  },
  {
    name: "GET /api/users",
    call: (c) => c.get("/api/users"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 403,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 200,
    },
  },
  {
    name: "POST /api/users (people join by invitation instead)",
    call: (c) => c.post("/api/users", { data: { email: "someone@harbourline.test" } }),
    expect: {
      anonymous: 405,
      owner: 405,
      senior: 405,
      technician: 405,
      apprentice: 405,
      otherShopOwner: 405,
    },
  },
  {
    name: "GET /api/invitations",
    call: (c) => c.get("/api/invitations"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 403,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 200,
    },
  },
  {
    name: "POST /api/invitations (malformed)",
    call: (c) => c.post("/api/invitations", { data: { email: "nope", role: "boss" } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 403,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "DELETE /api/invitations/:id (a Harbourline invitation)",
    call: (c) => c.delete(`/api/invitations/${harbourlineInvitationId}`),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 403,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 404,
    },
  },
  {
    name: "POST /api/invitations/accept (a link never issued; public)",
    call: (c) =>
      c.post("/api/invitations/accept", {
        data: { token: "A".repeat(43), name: "Nobody", password: "long-enough-password" },
      }),
    expect: {
      anonymous: 404,
      owner: 404,
      senior: 404,
      technician: 404,
      apprentice: 404,
      otherShopOwner: 404,
    },
  },
  {
    name: "POST /api/invitations/accept (malformed)",
    call: (c) => c.post("/api/invitations/accept", { data: { token: "short", password: "x" } }),
    expect: {
      anonymous: 400,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 400,
      otherShopOwner: 400,
    },
  },
  {
    name: "PATCH /api/users/:id (a Harbourline technician)",
    call: (c) => c.patch(`/api/users/${harbourlineTechId}`, { data: { role: "technician" } }),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 403,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 404,
    },
  },
  {
    name: "PATCH /api/users/:id (a Ridgeback user)",
    call: (c) => c.patch(`/api/users/${ridgebackUserId}`, { data: { active: true } }),
    expect: {
      anonymous: 401,
      owner: 404,
      senior: 403,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /api/cases",
    call: (c) => c.get("/api/cases"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /api/cases/:id (a Harbourline case)",
    call: (c) => c.get(`/api/cases/${harbourlineCaseId}`),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 404,
    },
  },
  {
    name: "POST /api/cases (malformed)",
    call: (c) => c.post("/api/cases", { data: { complaint: "" } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 400,
      otherShopOwner: 400,
    },
  },
  {
    name: "PUT /api/cases/:id/interview (malformed)",
    call: (c) =>
      c.put(`/api/cases/${harbourlineCaseId}/interview`, { data: { baseVersion: 0, step: "nowhere" } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 400,
      otherShopOwner: 400,
    },
  },
  {
    name: "POST /api/cases/:id/submit (malformed)",
    call: (c) => c.post(`/api/cases/${harbourlineCaseId}/submit`, { data: { conclusionCause: "gremlins" } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 400,
      otherShopOwner: 400,
    },
  },
  {
    name: "POST /api/cases/:id/signoff (sent back without a comment)",
    call: (c) => c.post(`/api/cases/${harbourlineCaseId}/signoff`, { data: { verdict: "sent_back" } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "GET /api/vehicles",
    call: (c) => c.get("/api/vehicles"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /api/cases/:id (not a number)",
    call: (c) => c.get("/api/cases/abc"),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 400,
      otherShopOwner: 400,
    },
  },
  {
    name: "GET /api/specs",
    call: (c) => c.get("/api/specs?q=Silverado"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "POST /api/specs (malformed)",
    call: (c) => c.post("/api/specs", { data: { make: "", labelChargeG: "lots" } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "DELETE /api/specs/:id (no such row)",
    call: (c) => c.delete("/api/specs/999999999"),
    expect: {
      anonymous: 401,
      owner: 404,
      senior: 404,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 404,
    },
  },
  {
    name: "POST /api/specs/import?step=preview (empty file)",
    call: (c) => c.post("/api/specs/import?step=preview", { data: { csv: "" } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "GET /api/specs/export",
    call: (c) => c.get("/api/specs/export"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /api/specs/matches (a Harbourline vehicle)",
    call: (c) => c.get(`/api/specs/matches?vehicleId=${harbourlineVehicleId}`),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 404,
    },
  },
  {
    name: "GET /api/specs/matches (not a number)",
    call: (c) => c.get("/api/specs/matches?vehicleId=abc"),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 400,
      otherShopOwner: 400,
    },
  },
  {
    name: "GET /api/specs/oil-allowances",
    call: (c) => c.get("/api/specs/oil-allowances"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 200,
    },
  },
  {
    name: "PUT /api/specs/oil-allowances (malformed)",
    call: (c) => c.put("/api/specs/oil-allowances", { data: { allowancesMl: { condenser: -4, wiper: 3 } } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "GET /api/cases/:id/service (a Harbourline case)",
    call: (c) => c.get(`/api/cases/${harbourlineCaseId}/service`),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 200,
      otherShopOwner: 404,
    },
  },
  {
    name: "PUT /api/cases/:id/service (malformed)",
    call: (c) =>
      c.put(`/api/cases/${harbourlineCaseId}/service`, {
        data: { baseVersion: -1, step: "somewhere", recoveredChargeG: "lots" },
      }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "DELETE /api/cases/:id/service (version missing)",
    call: (c) => c.delete(`/api/cases/${harbourlineCaseId}/service`),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "GET /api/cylinders",
    call: (c) => c.get("/api/cylinders"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 403,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /api/cylinders?limit=0 (malformed page)",
    call: (c) => c.get("/api/cylinders?limit=0"),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "POST /api/cylinders (malformed)",
    call: (c) => c.post("/api/cylinders", { data: { label: "", tareG: -1 } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "PATCH /api/cylinders/:id (a Harbourline cylinder, kept active)",
    call: (c) => c.patch(`/api/cylinders/${harbourlineCylinderId}`, { data: { retired: false } }),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 403,
      otherShopOwner: 404,
    },
  },
  {
    name: "GET /api/ledger/movements",
    call: (c) => c.get("/api/ledger/movements"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 403,
      otherShopOwner: 200,
    },
  },
  {
    name: "POST /api/ledger/movements (malformed)",
    call: (c) => c.post("/api/ledger/movements", { data: { type: "vented", massG: 0 } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "GET /api/ledger/movements?limit=500 (past a page)",
    call: (c) => c.get("/api/ledger/movements?limit=500"),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "POST /api/ledger/movements/:id/reversal (no such line)",
    call: (c) =>
      c.post("/api/ledger/movements/999999999/reversal", { data: { reason: "Typed the wrong mass" } }),
    expect: {
      anonymous: 401,
      owner: 404,
      senior: 404,
      technician: 404,
      apprentice: 403,
      otherShopOwner: 404,
    },
  },
  {
    name: "POST /api/ledger/movements/:id/reversal (no reason)",
    call: (c) => c.post("/api/ledger/movements/1/reversal", { data: { reason: "" } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "PUT /api/me/password (malformed)",
    call: (c) => c.put("/api/me/password", { data: { newPassword: "short" } }),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 400,
      otherShopOwner: 400,
    },
  },
  {
    // The Ridgeback owner: another shop's person for Harbourline, themselves for Ridgeback.
    name: "POST /api/users/:id/password-reset (the Ridgeback owner)",
    call: (c) => c.post(`/api/users/${ridgebackUserId}/password-reset`),
    expect: {
      anonymous: 401,
      owner: 404,
      senior: 403,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 409,
    },
  },
  {
    name: "POST /api/users/:id/password-reset (malformed id)",
    call: (c) => c.post("/api/users/NOT-AN-ID/password-reset"),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 403,
      technician: 403,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
  {
    name: "GET /api/ledger/report?format=csv",
    call: (c) => c.get("/api/ledger/report?format=csv"),
    expect: {
      anonymous: 401,
      owner: 200,
      senior: 200,
      technician: 200,
      apprentice: 403,
      otherShopOwner: 200,
    },
  },
  {
    name: "GET /api/ledger/report?format=xml",
    call: (c) => c.get("/api/ledger/report?format=xml"),
    expect: {
      anonymous: 401,
      owner: 400,
      senior: 400,
      technician: 400,
      apprentice: 403,
      otherShopOwner: 400,
    },
  },
];

const everyone = (status: number): Expectation => ({
  anonymous: status,
  owner: status,
  senior: status,
  technician: status,
  apprentice: status,
  otherShopOwner: status,
});
// Shop routes on the demo CX-5 case (the technician's own): the apprentice may read but not change it.
const onSharedCase = (harbourline: number, apprentice: number): Expectation => ({
  anonymous: 401,
  owner: harbourline,
  senior: harbourline,
  technician: harbourline,
  apprentice,
  otherShopOwner: 404,
});
const ownerRoutes: typeof table = [
  {
    name: "GET /api/cases/:id/share-links",
    call: (c) => c.get(`/api/cases/${sharedCaseId}/share-links`),
    expect: onSharedCase(200, 200),
  },
  {
    name: "POST /api/cases/:id/share-links",
    call: (c) => c.post(`/api/cases/${sharedCaseId}/share-links`, { data: { expiresInDays: 7 } }),
    expect: onSharedCase(200, 403),
  },
  {
    name: "POST /api/cases/:id/share-links (malformed)",
    call: (c) => c.post(`/api/cases/${sharedCaseId}/share-links`, { data: { expiresInDays: 0 } }),
    expect: { ...everyone(400), anonymous: 401 },
  },
  {
    name: "DELETE /api/cases/:id/share-links/:linkId (no such link)",
    call: (c) => c.delete(`/api/cases/${sharedCaseId}/share-links/999999999`),
    expect: onSharedCase(404, 403),
  },
  {
    name: "GET /api/cases/:id/proposal",
    call: (c) => c.get(`/api/cases/${sharedCaseId}/proposal`),
    expect: onSharedCase(200, 200),
  },
  {
    name: "POST /api/cases/:id/proposal (malformed)",
    call: (c) =>
      c.post(`/api/cases/${sharedCaseId}/proposal`, { data: { repairIds: ["teleport"], priceMinor: -1 } }),
    expect: { ...everyone(400), anonymous: 401 },
  },
  {
    name: "GET /api/cases/:id/emails",
    call: (c) => c.get(`/api/cases/${sharedCaseId}/emails`),
    expect: onSharedCase(200, 200),
  },
  {
    name: "POST /api/cases/:id/emails (malformed)",
    call: (c) => c.post(`/api/cases/${sharedCaseId}/emails`, { data: { to: "nope" } }),
    expect: { ...everyone(400), anonymous: 401 },
  },
  {
    name: "POST /api/cases/:id/emails/:emailId/retry (no such e-mail)",
    call: (c) => c.post(`/api/cases/${sharedCaseId}/emails/999999999/retry`),
    expect: onSharedCase(404, 403),
  },
  {
    name: "GET /api/cases/:id/attachments",
    call: (c) => c.get(`/api/cases/${sharedCaseId}/attachments`),
    expect: onSharedCase(200, 200),
  },
  {
    name: "POST /api/cases/:id/attachments (JSON, not a photo)",
    call: (c) => c.post(`/api/cases/${sharedCaseId}/attachments`, { data: { file: "x" } }),
    expect: onSharedCase(415, 403),
  },
  {
    name: "GET /api/cases/:id/attachments/:attachmentId (a Harbourline photo)",
    call: (c) => c.get(`/api/cases/${sharedCaseId}/attachments/${harbourlinePhotoId}?size=thumb`),
    expect: onSharedCase(200, 200),
  },
  {
    name: "PATCH /api/cases/:id/attachments/:attachmentId (malformed)",
    call: (c) => c.patch(`/api/cases/${sharedCaseId}/attachments/${harbourlinePhotoId}`, { data: {} }),
    expect: { ...everyone(400), anonymous: 401 },
  },
  {
    name: "DELETE /api/cases/:id/attachments/:attachmentId (no such photo)",
    call: (c) => c.delete(`/api/cases/${sharedCaseId}/attachments/999999999`),
    expect: onSharedCase(404, 403),
  },
  {
    name: "PAGE /s/:token (public owner page, no session needed)",
    call: (c) => c.get(`/s/${harbourlineToken}`),
    expect: everyone(200),
  },
  {
    name: "PAGE /s/:token (a token of another shop's case shows only that case)",
    call: async (c) => {
      const response = await c.get(`/s/${ridgebackToken}`);
      expect(await response.text()).toContain("Ridgeback Cooling Works");
      return response;
    },
    expect: everyone(200),
  },
  {
    name: "PAGE /s/:token (malformed)",
    call: (c) => c.get(`/s/${MALFORMED_TOKEN}`),
    expect: everyone(404),
  },
  {
    name: "GET /api/s/:token/photos/:photoId (a shared photo)",
    call: (c) => c.get(`/api/s/${harbourlineToken}/photos/${harbourlinePhotoId}`),
    expect: everyone(200),
  },
  {
    name: "GET /api/s/:token/photos/:photoId (another shop's token)",
    call: (c) => c.get(`/api/s/${ridgebackToken}/photos/${harbourlinePhotoId}`),
    expect: everyone(404),
  },
  {
    name: "GET /api/s/:token/pdf",
    call: (c) => c.get(`/api/s/${harbourlineToken}/pdf`),
    expect: everyone(200),
  },
  {
    name: "GET /api/s/:token/pdf (malformed token)",
    call: (c) => c.get(`/api/s/${MALFORMED_TOKEN}/pdf`),
    expect: everyone(404),
  },
  {
    name: "POST /api/s/:token/answer (malformed)",
    call: (c) => c.post(`/api/s/${harbourlineToken}/answer`, { data: { proposalId: 1, answer: "maybe" } }),
    expect: everyone(400),
  },
  {
    name: "POST /api/s/:token/answer (another shop's token, a Harbourline proposal)",
    call: (c) =>
      c.post(`/api/s/${ridgebackToken}/answer`, {
        data: { proposalId: harbourlineProposalId, answer: "approved" },
      }),
    expect: everyone(409),
  },
];
table.push(...ownerRoutes);

// The casebook: every role of the shop searches its own cases; another shop's case is not found.
const signedIn = (status: number): Expectation => ({ ...everyone(status), anonymous: 401 });
const casebookRoutes: typeof table = [
  {
    name: "PAGE /casebook (no session goes to sign-in)",
    call: (c) => c.get("/casebook?q=warm&status=closed", { maxRedirects: 0 }),
    expect: { ...everyone(200), anonymous: 307 },
  },
  {
    name: "GET /api/casebook",
    call: (c) => c.get("/api/casebook?q=warm&refrigerant=R-134a&device=orifice_tube"),
    expect: signedIn(200),
  },
  {
    name: "GET /api/casebook (malformed: unknown refrigerant, page size)",
    call: (c) => c.get("/api/casebook?refrigerant=R-999&pageSize=7"),
    expect: signedIn(400),
  },
  {
    name: "GET /api/casebook/facets",
    call: (c) => c.get("/api/casebook/facets?cause=condenser_airflow"),
    expect: signedIn(200),
  },
  {
    name: "GET /api/casebook/facets (malformed dates)",
    call: (c) => c.get("/api/casebook/facets?from=2026-13-40"),
    expect: signedIn(400),
  },
  {
    name: "GET /api/casebook/export",
    call: (c) => c.get("/api/casebook/export?status=closed"),
    expect: signedIn(200),
  },
  {
    name: "GET /api/cases/:id/similar (a Harbourline case)",
    call: (c) => c.get(`/api/cases/${harbourlineCaseId}/similar`),
    expect: { ...signedIn(200), otherShopOwner: 404 },
  },
  {
    name: "GET /api/cases/:id/similar (not a number)",
    call: (c) => c.get("/api/cases/abc/similar"),
    expect: signedIn(400),
  },
];
table.push(...casebookRoutes);
/** A signed-in client of its own for `who`, for rows that would end the shared session. */
async function ownClient(who: Who): Promise<APIRequestContext> {
  if (who === "anonymous") return apiClient();
  return signedInClient(who === "otherShopOwner" ? "owner@ridgeback.test" : DEMO_USERS[who].email);
}
// A page without a session is sent to sign-in by proxy.ts; a missing permission renders 403.
const page = (ok: Partial<Expectation>, otherwise = 403): Expectation => ({
  anonymous: 307,
  owner: otherwise,
  senior: otherwise,
  technician: otherwise,
  apprentice: otherwise,
  otherShopOwner: otherwise,
  ...ok,
});
const allRoles = { owner: 200, senior: 200, technician: 200, apprentice: 200, otherShopOwner: 200 };
const moreRoutes: typeof table = [
  {
    name: "POST /api/session (malformed; public)",
    call: (c) => c.post("/api/session", { data: { email: "not-an-address", password: "" } }),
    expect: everyone(400),
  },
  {
    name: "DELETE /api/session (sign out: ends that session only; public)",
    call: (c) => c.get("/api/me"),
    callAs: async (who) => {
      const own = await ownClient(who);
      const status = (await own.delete("/api/session")).status();
      expect((await own.get("/api/me")).status()).toBe(401);
      await own.dispose();
      return status;
    },
    expect: everyone(200),
  },
  {
    name: "PUT /api/cases/:id/interview (a Harbourline case at a version long gone)",
    call: (c) =>
      c.put(`/api/cases/${sharedCaseId}/interview`, {
        data: { baseVersion: 1, step: "complaint", answers: {} },
      }),
    expect: { ...onSharedCase(409, 403) },
  },
  {
    name: "POST /api/cases/:id/signoff (malformed)",
    call: (c) => c.post(`/api/cases/${harbourlineCaseId}/signoff`, { data: { verdict: "maybe" } }),
    expect: { ...signedIn(400), technician: 403, apprentice: 403 },
  },
  {
    name: "POST /api/cases/:id/outcome (malformed)",
    call: (c) => c.post(`/api/cases/${harbourlineCaseId}/outcome`, { data: { causes: ["gremlins"] } }),
    expect: signedIn(400),
  },
  {
    name: "POST /api/cases/:id/outcome (no confirmed cause)",
    call: (c) =>
      c.post(`/api/cases/${harbourlineCaseId}/outcome`, { data: { causes: [], repairIds: ["leak_repair"] } }),
    expect: signedIn(400),
  },
  {
    name: "POST /api/cases/:id/reopen (no reason)",
    call: (c) => c.post(`/api/cases/${harbourlineCaseId}/reopen`, { data: { reason: "  " } }),
    expect: { ...signedIn(400), technician: 403, apprentice: 403 },
  },
  {
    name: "PUT /api/specs/:id (malformed)",
    call: (c) => c.put("/api/specs/999999999", { data: { make: "", yearFrom: "old" } }),
    expect: { ...signedIn(400), technician: 403, apprentice: 403 },
  },
  {
    name: "PAGE / (home: sends each person to sign-in or the case list)",
    call: (c) => c.get("/", { maxRedirects: 0 }),
    expect: { ...everyone(307) },
  },
  {
    name: "PAGE /sign-in (a signed-in person goes on to the app)",
    call: (c) => c.get("/sign-in", { maxRedirects: 0 }),
    expect: { ...everyone(307), anonymous: 200 },
  },
  {
    name: "PAGE /invitation/:token (a link never issued; public)",
    call: (c) => c.get(`/invitation/${"A".repeat(43)}`, { maxRedirects: 0 }),
    expect: everyone(200),
  },
  { name: "PAGE /cases", call: (c) => c.get("/cases", { maxRedirects: 0 }), expect: page(allRoles) },
  { name: "PAGE /cases/new", call: (c) => c.get("/cases/new", { maxRedirects: 0 }), expect: page(allRoles) },
  {
    name: "PAGE /cases/:id (a Harbourline case)",
    call: (c) => c.get(`/cases/${sharedCaseId}`, { maxRedirects: 0 }),
    expect: page({ ...allRoles, otherShopOwner: 404 }),
  },
  {
    name: "PAGE /cases/:id (not a number)",
    call: (c) => c.get("/cases/abc", { maxRedirects: 0 }),
    expect: page({}, 404),
  },
  {
    // The CX-5 case is submitted: its interview no longer changes, so everyone goes to the case page.
    name: "PAGE /cases/:id/interview (a submitted Harbourline case)",
    call: (c) => c.get(`/cases/${sharedCaseId}/interview`, { maxRedirects: 0 }),
    expect: page({ ...everyone(307), otherShopOwner: 404 }),
  },
  {
    name: "PAGE /cases/:id/service (a Harbourline case)",
    call: (c) => c.get(`/cases/${sharedCaseId}/service`, { maxRedirects: 0 }),
    expect: page({ ...allRoles, otherShopOwner: 404 }),
  },
  {
    name: "PAGE /ledger",
    call: (c) => c.get("/ledger", { maxRedirects: 0 }),
    expect: page({ ...allRoles, apprentice: 403 }),
  },
  {
    name: "PAGE /settings/users",
    call: (c) => c.get("/settings/users", { maxRedirects: 0 }),
    expect: page({ owner: 200, otherShopOwner: 200 }),
  },
  {
    name: "PAGE /signoff",
    call: (c) => c.get("/signoff", { maxRedirects: 0 }),
    expect: page({ owner: 200, senior: 200, otherShopOwner: 200 }),
  },
  {
    name: "PAGE /account/password (each person changes their own)",
    call: (c) => c.get("/account/password", { maxRedirects: 0 }),
    expect: page(allRoles),
  },
  {
    name: "PAGE /profile (each person sets their own units and locale)",
    call: (c) => c.get("/profile", { maxRedirects: 0 }),
    expect: page(allRoles),
  },
  { name: "PAGE /specs", call: (c) => c.get("/specs", { maxRedirects: 0 }), expect: page(allRoles) },
];
table.push(...moreRoutes);

for (const row of table) {
  test(`role × route: ${row.name}`, async () => {
    const got: Partial<Expectation> = {};
    for (const who of WHO)
      got[who] = row.callAs ? await row.callAs(who) : (await row.call(clients.get(who)!)).status();
    expect(got).toEqual(row.expect);
  });
}

test("a state-changing request from another origin is refused", async ({ playwright }) => {
  const foreign = await playwright.request.newContext({
    baseURL: BASE_URL,
    extraHTTPHeaders: { origin: "https://evil.example" },
  });
  const response = await foreign.post("/api/session", {
    data: { email: DEMO_USERS.owner.email, password: "x" },
  });
  expect(response.status()).toBe(403);
  await foreign.dispose();
});

test("sign-in: malformed body 400, wrong content type 415, wrong password 401, a burst 429", async () => {
  const client = await apiClient();
  expect((await client.post("/api/session", { data: { email: 42 } })).status()).toBe(400);
  const text = await client.post("/api/session", {
    data: "email=x",
    headers: { "content-type": "text/plain" },
  });
  expect(text.status()).toBe(415);
  const broken = await client.post("/api/session", {
    data: "{not json",
    headers: { "content-type": "application/json" },
  });
  expect(broken.status()).toBe(400);
  const email = "burst-target@harbourline.test";
  const statuses: number[] = [];
  for (let i = 0; i < 7; i++)
    statuses.push((await client.post("/api/session", { data: { email, password: `wrong-${i}` } })).status());
  expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
  expect(statuses.slice(5)).toEqual([429, 429]);
  const limited = await client.post("/api/session", { data: { email, password: "wrong" } });
  expect((await limited.json()).error.message).toMatch(/Too many sign-in attempts\. Wait 1 minute/);
  // The first pause is a minute (lib/server/sign-in-throttle.ts), counted down from the sixth attempt.
  const retryAfterS = Number(limited.headers()["retry-after"]);
  expect(retryAfterS).toBeGreaterThan(50);
  expect(retryAfterS).toBeLessThanOrEqual(60);
  await client.dispose();
});
