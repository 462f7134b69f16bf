import { can, type Permission, type Role } from "./roles";

export interface NavItem {
  href: string;
  label: string;
  permission: Permission;
}

// The order technicians asked for: the work in hand first, the shop's records after.
export const NAV_ITEMS: readonly NavItem[] = [
  { href: "/cases", label: "Cases", permission: "cases:read" },
  { href: "/signoff", label: "Sign-off", permission: "signoff:review" },
  { href: "/casebook", label: "Casebook", permission: "casebook:search" },
  { href: "/specs", label: "Spec table", permission: "specs:read" },
  { href: "/ledger", label: "Ledger", permission: "ledger:read" },
  { href: "/settings/users", label: "People", permission: "users:manage" },
  { href: "/profile", label: "Your units", permission: "cases:read" },
];

export function navigationFor(role: Role): NavItem[] {
  return NAV_ITEMS.filter((item) => can(role, item.permission));
}
