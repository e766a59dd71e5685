import { Router } from 'express';
import type { Knex } from 'knex';
import { createHealthRepository } from './repository';
import { createHealthService } from './service';

export function createHealthRouter(db: Knex): Router {
  const service = createHealthService(createHealthRepository(db));
  const router = Router();
  router.get('/', async (_req, res) => {
    res.set('Cache-Control', 'no-store').json(await service.check());
  });
  return router;
}
