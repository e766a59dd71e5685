import { Router } from 'express';
import type { Knex } from 'knex';
import multer from 'multer';
import { z } from 'zod';
import { errorCodes } from '../../shared/api/errors';
import { nearDuplicateQuerySchema, submissionSchema, uploadMetaSchema } from '../../shared/schemas/submissions';
import { UPLOAD_LIMITS } from '../../shared/uploads';
import type { User } from '../../shared/schemas/users';
import { ApiError, parseOr400 } from '../http/api-error';
import { currentUser, requireRole } from '../http/require-role';
import { utf8FileName } from './file-name';
import { createSubmissionsRepository } from './repository';
import { createSubmissionsService } from './service';

const setIdParams = z.object({ id: z.coerce.number().int().positive() });
const MB = 1024 * 1024;
type UploadRequest = Express.Request & { uploadingName?: string; uploadBytes?: number };

/**
 * Memory storage that counts the bytes of every file in the request and stops reading once the
 * total passes the request limit, so an oversized request is refused without being held.
 */
const boundedMemoryStorage: multer.StorageEngine = {
  _handleFile(req, file, cb) {
    const r = req as UploadRequest;
    const chunks: Buffer[] = [];
    let size = 0;
    let done = false;
    const finish = (err: Error | null, info?: Partial<Express.Multer.File>) => {
      if (done) return;
      done = true;
      cb(err, info);
    };
    file.stream.on('data', (chunk: Buffer) => {
      if (done) return;
      size += chunk.length;
      r.uploadBytes = (r.uploadBytes ?? 0) + chunk.length;
      if (r.uploadBytes > UPLOAD_LIMITS.requestBytes) {
        chunks.length = 0;
        finish(Object.assign(new Error('request too large'), { code: 'LIMIT_TOTAL_SIZE' }));
        file.stream.resume();
        return;
      }
      chunks.push(chunk);
    });
    file.stream.on('error', (err: Error) => finish(err));
    file.stream.on('end', () => finish(null, { buffer: Buffer.concat(chunks, size), size }));
  },
  _removeFile(_req, file, cb) {
    (file as { buffer?: Buffer }).buffer = undefined;
    cb(null);
  },
};

const upload = multer({
  storage: boundedMemoryStorage,
  limits: { fileSize: UPLOAD_LIMITS.fileBytes, files: UPLOAD_LIMITS.files },
  // Multer's size error does not say which file it was; files arrive one after another, so the
  // last one started is the one that ran over.
  fileFilter: (req, file, cb) => {
    file.originalname = utf8FileName(file.originalname);
    (req as UploadRequest).uploadingName = file.originalname;
    cb(null, true);
  },
});

const requestTooLarge = () =>
  new ApiError(413, errorCodes.tooLarge, `One upload request may carry at most ${UPLOAD_LIMITS.requestBytes / MB} MB of files, ${UPLOAD_LIMITS.files} files and ${UPLOAD_LIMITS.fileBytes / MB} MB each; send the rest in another request`, {
    limits: UPLOAD_LIMITS,
  });
// Room for the multipart boundaries and the meta field beside the files themselves.
const MULTIPART_OVERHEAD_BYTES = 1 * MB;

export function createSubmissionsRouter(db: Knex): Router {
  const service = createSubmissionsService(createSubmissionsRepository(db));
  const router = Router();
  const reviewer = requireRole('reviewer');
  router.post('/uploads/parse', reviewer, (req, res, next) => {
    // A declared length over the limit is refused before anything is read; the body is drained
    // (not kept) so the client can read the answer.
    if (Number(req.headers['content-length'] ?? 0) > UPLOAD_LIMITS.requestBytes + MULTIPART_OVERHEAD_BYTES) {
      req.resume();
      return next(requestTooLarge());
    }
    upload.array('files', UPLOAD_LIMITS.files)(req, res, (err: unknown) => {
      if (!err) return next();
      const e = err as { code?: string; field?: string; message?: string };
      if (e.code === 'LIMIT_FILE_SIZE') {
        const name = (req as UploadRequest).uploadingName ?? 'A file';
        return next(new ApiError(400, errorCodes.validation, `"${name}" is over the ${UPLOAD_LIMITS.fileBytes / MB} MB limit`, { fields: [{ field: 'files', message: `${name}: file too large` }] }));
      }
      if (e.code === 'LIMIT_TOTAL_SIZE' || e.code === 'LIMIT_FILE_COUNT' || (e.code === 'LIMIT_UNEXPECTED_FILE' && e.field === 'files')) return next(requestTooLarge());
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
    // The service lets go of each file's bytes as it goes; nothing else may keep them.
    req.files = undefined;
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
