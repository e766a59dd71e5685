import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { overlayQuerySchema, saveOverlaySchema } from '../../shared/schemas/overlay';
import { createDriversRepository } from '../drivers/repository';
import { parseOr400 } from '../http/api-error';
import { currentUser, requireRole } from '../http/require-role';
import { createOverlayRepository } from './repository';
import { createOverlayService, type OverlayServiceOptions } from './service';

const codeParams = z.object({ code: z.string().regex(/^[a-z0-9]{4,16}$/, 'must be a saved comparison code') });

/** Mounted at /api: GET /overlay builds a comparison, /overlays saves and reads links. */
export function createOverlayRouter(db: Knex, options: OverlayServiceOptions = {}): Router {
  const service = createOverlayService(createDriversRepository(db), createOverlayRepository(db), options);
  const router = Router();
  router.get('/overlay', async (req, res) => {
    const body = await service.overlayJson(parseOr400(overlayQuerySchema, req.query, 'query'));
    res.set('ETag', body.etag);
    if (req.fresh) {
      res.status(304).end();
      return;
    }
    res.type('application/json').send(body.bytes);
  });
  const mayWrite = options.allowAnonymousSave ? [] : [requireRole('member')];
  router.post('/overlays', ...mayWrite, async (req, res) => {
    const input = parseOr400(saveOverlaySchema, req.body ?? {}, 'body');
    res.status(201).json(await service.save(input, currentUser(req)?.id ?? null));
  });
  router.get('/me/overlays', requireRole('member'), async (req, res) => {
    res.json({ overlays: await service.listMine(currentUser(req)!.id) });
  });
  router.get('/overlays/:code', async (req, res) => {
    const { code } = parseOr400(codeParams, req.params, 'params');
    res.json(await service.getSaved(code));
  });
  return router;
}
