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
  "rig.submit": "rigger",
  "rig.sign": "lead",
  "checklist.template": "lead",
  "rig.reuse": "member",
  "checklist.run": "member",
  "reading.write": "member",
} as const satisfies Record<string, Role>;

export type Action = keyof typeof PERMISSIONS;

/** The actions every member of a crew may do. */
export type MemberAction = { [A in Action]: (typeof PERMISSIONS)[A] extends "member" ? A : never }[Action];

/** What each action lets a person do, in the words a refusal uses: "Only riggers, leads and owners may …". */
export const ACTION_WORDS: Record<Action, string> = {
  "crew.read": "read the crew, its people and settings",
  "crew.settings": "change the crew's settings",
  "crew.invite": "invite people to the crew",
  "crew.roles": "change roles and remove people",
  "kit.read": "read the Kit",
  "kit.write": "add and change gear in the Kit",
  "slip.read": "read the slip bench",
  "slip.write": "record slip tests and their traces",
  "slip.publish": "publish or revoke the slip table's read-only link",
  "rig.read": "read rigs and check lines",
  "rig.write": "plan and save rigs",
  "site.read": "read the crew's sites",
  "site.write": "add and change sites",
  "rig.submit": "submit rigs for review",
  "rig.sign": "sign rigs off or return them to their riggers",
  "checklist.template": "change the crew's on-site checklist",
  "rig.reuse": "use a signed-off rig for another site or day",
  "checklist.run": "run the on-site checklist",
  "reading.write": "record load-cell readings",
};

/** "a member", "an owner". */
export const withArticle = (role: Role) => `${role === "owner" ? "an" : "a"} ${role}`;

/** The roles that may do the action, in words: "riggers, leads and owners". */
export function rolesAllowed(action: Action): string {
  const allowed = ROLES.slice(ROLES.indexOf(PERMISSIONS[action])).map((r) => `${r}s`);
  return allowed.length === 1 ? allowed[0] : `${allowed.slice(0, -1).join(", ")} and ${allowed[allowed.length - 1]}`;
}

/** Why a page was refused to someone in the crew: the action it needs and the role they have. */
export interface RoleRefusal {
  action: Action;
  role: Role;
  crewName: string;
}

/** Why a role may not do an action, in one sentence for a page or a route's answer. */
export const refusalText = (action: Action, role: Role, crewName: string) =>
  `Only ${rolesAllowed(action)} may ${ACTION_WORDS[action]}; you are ${withArticle(role)} of ${crewName}.`;

/** True when `role` is at least the least role the action needs. */
export function can(role: Role, action: Action): boolean {
  return ROLES.indexOf(role) >= ROLES.indexOf(PERMISSIONS[action]);
}
