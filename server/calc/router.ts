import { Router } from 'express';
import { calcInputs, isCalcName } from '../../shared/schemas/calc';
import { notFound, parseOr400 } from '../http/api-error';
import { createCalcService } from './service';

export function createCalcRouter(): Router {
  const service = createCalcService();
  const router = Router();
  router.post('/:name', (req, res) => {
    const { name } = req.params;
    if (!isCalcName(name)) throw notFound(`Calculator "${name}"`);
    res.json(service.run(name, parseOr400(calcInputs[name], req.body, 'body')));
  });
  return router;
}
