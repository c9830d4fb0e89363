import type { RequestHandler } from 'express';
import type { OrgKind, Role } from '@kerfmark/contracts';
import { forbidden } from '../lib/httpError';

/** Lets through only users of the given organisation kind and, if named, roles. */
export function allow(rule: { kind?: OrgKind; roles?: Role[] }): RequestHandler {
  return (req, _res, next) => {
    const user = req.user!;
    if (rule.kind && user.orgKind !== rule.kind) {
      return next(forbidden(rule.kind === 'printer' ? 'Only printers can do this.' : 'Only die shops can do this.'));
    }
    if (rule.roles && !rule.roles.includes(user.role)) {
      return next(forbidden(`Only ${rule.roles.join(' or ')} users can do this.`));
    }
    next();
  };
}
