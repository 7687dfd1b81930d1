import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { ServerConfig } from '@/server/config';

export const addressKey = (req: Request) => ipKeyGenerator(req.ip ?? '');
const accountKey = (req: Request) => String(req.body?.email ?? '').trim().toLowerCase().slice(0, 254);

interface LimitOptions {
  /** Multiplies the configured allowance. */
  scale?: number;
  /** Count every attempt, not only failed ones (for forms that answer the same whatever happens). */
  countAll?: boolean;
  message?: string;
}

/**
 * Limits attempts in the sign-in window under one key: an account, counted across every address, or an address,
 * counted across every account. By default only failed attempts (answers of 400 and above) count, so a busy office
 * behind one address is slowed only by its own mistakes.
 */
export function attemptLimiter(config: ServerConfig, name: string, key: (req: Request) => string, opts: LimitOptions = {}): RequestHandler {
  const message = opts.message ?? 'Too many attempts. Wait a few minutes and try again.';
  return rateLimit({
    windowMs: config.loginRateLimit.windowMs,
    limit: config.loginRateLimit.max * (opts.scale ?? 1),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    skipSuccessfulRequests: !opts.countAll,
    keyGenerator: (req) => `${name}|${key(req)}`,
    handler: (_req, res, _next, options) => {
      res.status(options.statusCode).json({ error: { code: 'rate-limited', message } });
    },
  });
}

/** Per account across addresses, and per address across accounts (five times the allowance: several people share one). */
export function accountAndAddressLimits(config: ServerConfig, name: string, opts: Omit<LimitOptions, 'scale'> = {}): RequestHandler[] {
  return [attemptLimiter(config, `${name}:address`, addressKey, { ...opts, scale: 5 }), attemptLimiter(config, `${name}:account`, accountKey, opts)];
}
