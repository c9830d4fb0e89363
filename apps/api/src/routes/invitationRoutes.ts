import { Router, type RequestHandler } from 'express';
import { InvitationAccept, InvitationPreviewQuery } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

export function invitationRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  const adminOnly = [requireAuth, allow({ roles: ['admin'] })];

  // Public: the invitee has no account yet; the token is the credential.
  router.get('/preview', async (req, res) => {
    const { token } = parse(InvitationPreviewQuery, req.query);
    res.json(await services.invitations.preview(token));
  });

  router.post('/accept', async (req, res) => {
    const input = parse(InvitationAccept, req.body);
    res.status(201).json(await services.invitations.accept(input));
  });

  router.get('/', ...adminOnly, async (req, res) => {
    res.json(await services.invitations.list(req.user!));
  });

  router.post('/:id/resend', ...adminOnly, async (req, res) => {
    res.json(await services.invitations.resend(req.user!, parseId(req.params.id, 'That invitation')));
  });

  router.post('/:id/revoke', ...adminOnly, async (req, res) => {
    res.json(await services.invitations.revoke(req.user!, parseId(req.params.id, 'That invitation')));
  });

  return router;
}
