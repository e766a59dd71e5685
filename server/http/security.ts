import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import helmet from 'helmet';
import { errorCodes } from '../../shared/api/errors';
import { ApiError } from './api-error';

const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * CSRF defence for cookie sessions, on top of SameSite=Lax: a state-changing request must come
 * from one of our own origins. A request with no Origin or Referer is refused too when it carries
 * a session cookie, since a browser would have sent one of them.
 */
export function sameOriginOnly(allowedOrigins: readonly string[], sessionCookie: string): RequestHandler {
  const allowed = new Set(allowedOrigins.map((o) => o.replace(/\/$/, '')));
  return (req, _res, next) => {
    if (!UNSAFE.has(req.method)) return next();
    const origin = req.get('origin') ?? (req.get('referer') ? new URL(req.get('referer') as string).origin : undefined);
    const self = `${req.protocol}://${req.get('host')}`;
    if (origin !== undefined) {
      if (origin === self || allowed.has(origin)) return next();
      return next(new ApiError(403, errorCodes.forbidden, `Cross-site request refused (origin ${origin})`));
    }
    if ((req.get('cookie') ?? '').includes(`${sessionCookie}=`)) {
      return next(new ApiError(403, errorCodes.forbidden, 'A signed-in change must say where it comes from (Origin header missing)'));
    }
    next();
  };
}

export function limiter(perMinute: number, what: string): RequestHandler {
  return rateLimit({
    windowMs: 60_000,
    limit: perMinute,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(new ApiError(429, errorCodes.tooManyRequests, `Too many ${what}; try again in a minute`)),
  });
}

// CanvasKit is WebAssembly: 'wasm-unsafe-eval' lets it compile without allowing JS eval.
const directives = {
  defaultSrc: ["'self'"],
  scriptSrc: ["'self'", "'wasm-unsafe-eval'"],
  styleSrc: ["'self'", "'unsafe-inline'"],
  imgSrc: ["'self'", 'data:', 'blob:'],
  fontSrc: ["'self'", 'data:'],
  connectSrc: ["'self'"],
  workerSrc: ["'self'", 'blob:'],
  objectSrc: ["'none'"],
  baseUri: ["'self'"],
  formAction: ["'self'"],
  frameAncestors: ["'self'"],
  // Served over plain http on a LAN, upgrading would break every asset; https deployments set HSTS.
  upgradeInsecureRequests: null,
};

const hsts = helmet.strictTransportSecurity();

/**
 * Helmet's headers, with Strict-Transport-Security only on https requests (req.secure, which
 * follows X-Forwarded-Proto when the app trusts its proxy). Browsers ignore HSTS over plain http,
 * and a LAN install reached over http by name would otherwise be told it should be https.
 */
function withHttpsHsts(headers: RequestHandler): RequestHandler {
  return (req, res, next) => headers(req, res, (err?: unknown) => (err ? next(err) : req.secure ? hsts(req, res, next) : next()));
}

export const securityHeaders = withHttpsHsts(helmet({ contentSecurityPolicy: { directives }, crossOriginEmbedderPolicy: false, strictTransportSecurity: false }));

/** Embed views are meant to sit in other sites' articles, so they may be framed anywhere. */
export const embedSecurityHeaders = withHttpsHsts(
  helmet({
    contentSecurityPolicy: { directives: { ...directives, frameAncestors: ['*'] } },
    crossOriginEmbedderPolicy: false,
    frameguard: false,
    strictTransportSecurity: false,
  }),
);
