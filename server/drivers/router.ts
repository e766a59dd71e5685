import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { driverListQuerySchema } from '../../shared/schemas/drivers';
import { parseOr400 } from '../http/api-error';
import { createDriversRepository } from './repository';
import { createDriversService } from './service';

const slugParams = z.object({ slug: z.string().regex(/^[a-z0-9-]{1,160}$/, 'must be lower-case letters, digits and dashes') });

export function createDriversRouter(db: Knex): Router {
  const service = createDriversService(createDriversRepository(db));
  const router = Router();
  router.get('/', async (req, res) => {
    res.json(await service.list(parseOr400(driverListQuerySchema, req.query, 'query')));
  });
  router.get('/:slug', async (req, res) => {
    const { slug } = parseOr400(slugParams, req.params, 'params');
    res.json(await service.get(slug));
  });
  return router;
}
