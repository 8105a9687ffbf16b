import type { Permission } from "@/lib/auth/permissions";

export interface NavItem {
  href: string;
  label: string;
  /** Shown only to roles with this permission; the pages check it again on the server. */
  permission?: Permission;
}

/** The workspace's sections, in the order they appear in the header. */
export const NAV_ITEMS: NavItem[] = [
  { href: "/scenarios", label: "Scenarios" },
  { href: "/compare", label: "Compare" },
  { href: "/layers", label: "Layers", permission: "layer:view" },
  { href: "/admin/people", label: "People", permission: "admin:people" },
  { href: "/admin/outbox", label: "Outbox", permission: "admin:people" },
  { href: "/admin/audit", label: "Audit trail", permission: "admin:people" },
];
