import { Router } from 'express';
import type { Knex } from 'knex';
import multer from 'multer';
import { z } from 'zod';
import { errorCodes } from '../../shared/api/errors';
import { nearDuplicateQuerySchema, submissionSchema, uploadMetaSchema } from '../../shared/schemas/submissions';
import type { User } from '../../shared/schemas/users';
import { ApiError, parseOr400 } from '../http/api-error';
import { currentUser, requireRole } from '../http/require-role';
import { createSubmissionsRepository } from './repository';
import { createSubmissionsService } from './service';

const setIdParams = z.object({ id: z.coerce.number().int().positive() });
const MAX_FILE_BYTES = 5 * 1024 * 1024;
type UploadRequest = Express.Request & { uploadingName?: string };
const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_FILE_BYTES, files: 40 },
  // Multer's size error does not say which file it was; files arrive one after another, so the
  // last one started is the one that ran over.
  fileFilter: (req, file, cb) => {
    (req as UploadRequest).uploadingName = file.originalname;
    cb(null, true);
  },
});

export function createSubmissionsRouter(db: Knex): Router {
  const service = createSubmissionsService(createSubmissionsRepository(db));
  const router = Router();
  const reviewer = requireRole('reviewer');
  router.post('/uploads/parse', reviewer, (req, res, next) => {
    upload.array('files', 40)(req, res, (err: unknown) => {
      if (!err) return next();
      const e = err as { code?: string; field?: string; message?: string };
      if (e.code === 'LIMIT_FILE_SIZE') {
        const name = (req as UploadRequest).uploadingName ?? 'A file';
        return next(new ApiError(400, errorCodes.validation, `"${name}" is over the ${MAX_FILE_BYTES / 1024 / 1024} MB limit`, { fields: [{ field: 'files', message: `${name}: file too large` }] }));
      }
      next(new ApiError(400, errorCodes.badRequest, `Upload could not be read: ${e.message ?? 'unknown error'}`));
    });
  }, async (req, res) => {
    let metaJson: unknown;
    try {
      metaJson = JSON.parse(String((req.body as { meta?: string }).meta ?? '[]'));
    } catch {
      throw new ApiError(400, errorCodes.validation, 'meta must be JSON', { fields: [{ field: 'meta', message: 'not JSON' }] });
    }
    const meta = parseOr400(uploadMetaSchema, metaJson, 'body');
    const files = ((req.files as Express.Multer.File[] | undefined) ?? []).map((f) => ({ originalname: f.originalname, buffer: f.buffer }));
    res.json(await service.parse(currentUser(req) as User, files, meta));
  });
  router.post('/submissions', reviewer, async (req, res) => {
    const input = parseOr400(submissionSchema, req.body ?? {}, 'body');
    res.status(201).json(await service.submit(currentUser(req) as User, input));
  });
  router.post('/submissions/:id/renormalise', requireRole('moderator'), async (req, res) => {
    const { id } = parseOr400(setIdParams, req.params, 'params');
    res.json(await service.renormalise(id));
  });
  router.get('/submissions/mine', reviewer, async (req, res) => {
    res.json({ submissions: await service.mine(currentUser(req) as User) });
  });
  router.get('/submissions/near-duplicates', reviewer, async (req, res) => {
    res.json(await service.nearDuplicates(currentUser(req) as User, parseOr400(nearDuplicateQuerySchema, req.query, 'query')));
  });
  return router;
}
