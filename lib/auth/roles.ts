// Roles and what each may do. Pure: used by pages, handlers and the navigation alike.
export const ROLES = ["owner", "senior", "technician", "apprentice"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  owner: "Owner",
  senior: "Senior technician",
  technician: "Technician",
  apprentice: "Apprentice",
};

export type Permission =
  | "cases:read"
  | "cases:write"
  | "signoff:review"
  | "casebook:search"
  | "specs:read"
  | "specs:edit"
  | "ledger:read"
  | "ledger:write"
  | "service:write"
  | "users:manage"
  | "shop:settings";

const GRANTS: Record<Role, readonly Permission[]> = {
  owner: [
    "cases:read",
    "cases:write",
    "signoff:review",
    "casebook:search",
    "specs:read",
    "specs:edit",
    "ledger:read",
    "ledger:write",
    "service:write",
    "users:manage",
    "shop:settings",
  ],
  senior: [
    "cases:read",
    "cases:write",
    "signoff:review",
    "casebook:search",
    "specs:read",
    "specs:edit",
    "ledger:read",
    "ledger:write",
    "service:write",
  ],
  // Recovering and charging refrigerant is certified work: apprentices read the record but do not enter it.
  technician: [
    "cases:read",
    "cases:write",
    "casebook:search",
    "specs:read",
    "ledger:read",
    "ledger:write",
    "service:write",
  ],
  apprentice: ["cases:read", "cases:write", "casebook:search", "specs:read"],
};

export function can(role: Role, permission: Permission): boolean {
  return GRANTS[role].includes(permission);
}

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}
