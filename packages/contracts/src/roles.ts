// The kinds of organisation and the roles, with their names; their schemas are in roleSchemas.ts, so that
// the web app's first load, which shows these names, carries no zod.

/** The two kinds of organisation on Kerfmark. */
export const orgKinds = ['printer', 'die_shop'] as const;

export const roles = ['buyer', 'purchasing', 'estimator', 'admin'] as const;

// The same unions as the schemas' types in roleSchemas.ts, which imports the lists from here.
type OrgKind = (typeof orgKinds)[number];
type Role = (typeof roles)[number];

/** Which roles an organisation of each kind may give its users. */
export const rolesByOrgKind: Record<OrgKind, readonly Role[]> = {
  printer: ['buyer', 'purchasing', 'admin'],
  die_shop: ['estimator', 'admin'],
};

export const roleLabels: Record<Role, string> = {
  buyer: 'Print buyer',
  purchasing: 'Purchasing',
  estimator: 'Estimator',
  admin: 'Admin',
};

export const orgKindLabels: Record<OrgKind, string> = {
  printer: 'Printer',
  die_shop: 'Die shop',
};

export function roleFitsOrg(role: Role, kind: OrgKind): boolean {
  return rolesByOrgKind[kind].includes(role);
}
