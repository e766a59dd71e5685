import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { bandOfQuery } from '../../shared/schemas/band';
import { driverDetailQuerySchema, driverListQuerySchema, driverSlugSchema } from '../../shared/schemas/drivers';
import { parseOr400 } from '../http/api-error';
import { currentUser } from '../http/require-role';
import { createDriversRepository } from './repository';
import { createDriversService, viewerOf, type DriversServiceOptions } from './service';

const slugParams = z.object({ slug: driverSlugSchema });

export function createDriversRouter(db: Knex, options: DriversServiceOptions = {}): Router {
  const service = createDriversService(createDriversRepository(db), options);
  const router = Router();
  router.get('/', async (req, res) => {
    res.json(await service.list(parseOr400(driverListQuerySchema, req.query, 'query')));
  });
  router.get('/:slug', async (req, res) => {
    const { slug } = parseOr400(slugParams, req.params, 'params');
    const q = parseOr400(driverDetailQuerySchema, req.query, 'query');
    res.json(await service.get(slug, bandOfQuery(q) ?? undefined, viewerOf(currentUser(req))));
  });
  return router;
}
