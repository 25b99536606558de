// The crew roles, from least to most, and what each may do: the one table every check reads.
export const ROLES = ["member", "rigger", "lead", "owner"] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = {
  "crew.read": "member",
  "crew.settings": "lead",
  "crew.invite": "owner",
  "crew.roles": "owner",
  "kit.read": "member",
  "kit.write": "rigger",
  "slip.read": "member",
  "slip.write": "rigger",
  "slip.publish": "lead",
  "rig.read": "member",
  "rig.write": "rigger",
  "site.read": "member",
  "site.write": "rigger",
} as const satisfies Record<string, Role>;

export type Action = keyof typeof PERMISSIONS;

/** True when `role` is at least the least role the action needs. */
export function can(role: Role, action: Action): boolean {
  return ROLES.indexOf(role) >= ROLES.indexOf(PERMISSIONS[action]);
}
