import { z } from 'zod';
import { orgKinds, roles } from './roles';

export const OrgKind = z.enum(orgKinds);
export type OrgKind = z.infer<typeof OrgKind>;

export const Role = z.enum(roles);
export type Role = z.infer<typeof Role>;
