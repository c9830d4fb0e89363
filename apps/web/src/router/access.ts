import type { Me, OrgKind, Role } from '@kerfmark/contracts';

/** Who may open a route: the same rule drives the guard and the navigation. */
export interface Access {
  kinds?: OrgKind[];
  roles?: Role[];
}

export function canAccess(me: Me, access: Access | undefined): boolean {
  if (!access) return true;
  if (access.kinds && !access.kinds.includes(me.organisation.kind)) return false;
  if (access.roles && !access.roles.includes(me.role)) return false;
  return true;
}
