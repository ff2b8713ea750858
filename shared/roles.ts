export const ROLES = ['keeper', 'cook', 'helper'] as const;
export type Role = (typeof ROLES)[number];

/** What each role may do; the server enforces it, the client only hides what a role cannot do. */
export const PERMISSIONS = {
  read: ['keeper', 'cook', 'helper'],
  /** open, finish or discard a jar; tick a to-do */
  handleJars: ['keeper', 'cook', 'helper'],
  /** plan the week, record batches, edit products, recipes, meals, shelf and to-dos */
  cook: ['keeper', 'cook'],
  /** members, invitations, roles and household settings */
  manage: ['keeper'],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role | undefined, permission: Permission): boolean {
  return role !== undefined && (PERMISSIONS[permission] as readonly Role[]).includes(role);
}

export const ROLE_LABELS: Record<Role, string> = {
  keeper: 'Keeper',
  cook: 'Cook',
  helper: 'Helper',
};
