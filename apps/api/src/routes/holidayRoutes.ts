import { Router, type RequestHandler } from 'express';
import { HolidayCreate, HolidayRegionsQuery, HolidayYearQuery, PublicHolidaysLoad } from '@kerfmark/contracts';
import { parse, parseId } from '../lib/parse';
import { allow } from '../middleware/allow';
import type { Services } from '../services';

/** A die shop's holidays: its people read the calendar, its admin keeps it. */
export function holidayRoutes(services: Services, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use(requireAuth, allow({ kind: 'die_shop' }));
  const adminOnly = allow({ roles: ['admin'] });

  router.get('/', async (req, res) => {
    res.json(await services.holidays.year(req.user!, parse(HolidayYearQuery, req.query).year));
  });

  router.get('/regions', async (req, res) => {
    res.json(await services.holidays.places(req.user!, parse(HolidayRegionsQuery, req.query).country));
  });

  router.post('/', adminOnly, async (req, res) => {
    res.status(201).json(await services.holidays.add(req.user!, parse(HolidayCreate, req.body)));
  });

  router.post('/public', adminOnly, async (req, res) => {
    res.json(await services.holidays.loadPublic(req.user!, parse(PublicHolidaysLoad, req.body)));
  });

  router.delete('/:id', adminOnly, async (req, res) => {
    await services.holidays.remove(req.user!, parseId(req.params.id, 'That holiday'));
    res.status(204).end();
  });

  return router;
}
