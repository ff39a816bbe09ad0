import { can, type Actor, type Permission } from "@/server/policy";

export interface NavItem {
  href: string;
  label: string;
}

const items: (NavItem & { permission: Permission })[] = [
  { href: "/antenna-days", label: "Antenna days", permission: "antennaDays.view" },
  { href: "/bench", label: "Antenna bench", permission: "engine.use" },
  { href: "/gear", label: "Gear shelf", permission: "gear.view" },
  { href: "/lending", label: "Lending desk", permission: "loans.request" },
  { href: "/build-sessions", label: "Build sessions", permission: "buildSessions.view" },
  { href: "/members", label: "Members", permission: "members.manage" },
  { href: "/settings", label: "Settings", permission: "account.edit" },
];

/** The parts of Guyline this person may use, in menu order. */
export function navigationFor(actor: Actor): NavItem[] {
  return items.filter((item) => can(actor, item.permission)).map(({ href, label }) => ({ href, label }));
}
