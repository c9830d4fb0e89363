import { Router, type RequestHandler } from 'express';
import { ApproveInput, CreditNoteInput, DisputeInput, InvoiceInput, PaymentInput } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/**
 * The shop's invoices against a purchase order: the awarded shop raises, revises and credits;
 * the printer's purchasing matches, disputes, approves and records payment. The access module
 * decides who sees what (a print buyer sees the status only).
 */
export function invoiceRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  const shop = [requireAuth, allow({ kind: 'die_shop' })];
  const printer = [requireAuth, allow({ kind: 'printer' })];
  const requestId = (value: unknown) => parseId(value, 'That die request');
  const invoiceId = (value: unknown) => parseId(value, 'That invoice');
  const { invoices } = services;

  router.get('/requests/:id/invoices', requireAuth, async (req, res) => {
    res.json(await invoices.list(req.user!, requestId(req.params.id)));
  });
  router.post('/requests/:id/invoices', ...shop, async (req, res) => {
    res.status(201).json(await invoices.raise(req.user!, requestId(req.params.id), parse(InvoiceInput, req.body)));
  });
  router.get('/requests/:id/invoice-match', requireAuth, async (req, res) => {
    res.json(await invoices.match(req.user!, requestId(req.params.id)));
  });
  router.get('/invoices/:id', requireAuth, async (req, res) => {
    res.json(await invoices.get(req.user!, invoiceId(req.params.id)));
  });
  router.post('/invoices/:id/revisions', ...shop, async (req, res) => {
    res.status(201).json(await invoices.revise(req.user!, invoiceId(req.params.id), parse(InvoiceInput, req.body)));
  });
  router.post('/invoices/:id/credit-notes', ...shop, async (req, res) => {
    res.status(201).json(await invoices.credit(req.user!, invoiceId(req.params.id), parse(CreditNoteInput, req.body)));
  });
  router.post('/invoices/:id/dispute', ...printer, async (req, res) => {
    const { reason } = parse(DisputeInput, req.body);
    res.json(await invoices.dispute(req.user!, invoiceId(req.params.id), reason));
  });
  router.post('/invoices/:id/approve', ...printer, async (req, res) => {
    const { reason } = parse(ApproveInput, req.body ?? {});
    res.json(await invoices.approve(req.user!, invoiceId(req.params.id), reason));
  });
  router.post('/invoices/:id/payments', ...printer, async (req, res) => {
    res.status(201).json(await invoices.pay(req.user!, invoiceId(req.params.id), parse(PaymentInput, req.body)));
  });
  router.get('/invoice-record', requireAuth, async (req, res) => {
    res.json(await invoices.record(req.user!));
  });

  return router;
}
