import { Router, type RequestHandler } from 'express';
import { InvitationCreate, UserUpdate } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** The organisation's people: every member sees the team, admins invite and change roles. */
export function userRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use(requireAuth);
  const adminOnly = allow({ roles: ['admin'] });

  router.get('/', async (req, res) => {
    res.json(await services.users.list(req.user!));
  });

  // Adding a user means inviting them: they choose their own password from the e-mail.
  router.post('/', adminOnly, async (req, res) => {
    const input = parse(InvitationCreate, req.body);
    res.status(201).json(await services.invitations.create(req.user!, input));
  });

  router.patch('/:id', adminOnly, async (req, res) => {
    const id = parseId(req.params.id, 'That user');
    const patch = parse(UserUpdate, req.body);
    res.json(await services.users.update(req.user!, id, patch));
  });

  return router;
}
