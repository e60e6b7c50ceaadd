import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { DataSource } from 'typeorm';
import { SIGN_IN_FAILED_MESSAGE, SignInBodySchema } from '@understudy/shared-types';
import type { AppConfig } from '../../config';
import { UnauthorizedError } from '../../errors';
import { publicRoute, requireSignIn } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import { presentCurrentUser } from '../users/users.presenter';
import { recordSignIn, verifyCredentials } from './auth.service';
import { endSession, SESSION_COOKIE, startSession } from './session';

export function authRouter(db: DataSource, config: AppConfig): Router {
  const router = Router();

  // Only failed attempts count, per client address.
  const signInLimiter = rateLimit({
    windowMs: config.signInRateLimit.windowMs,
    limit: config.signInRateLimit.limit,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, res, _next, options) => {
      res.status(options.statusCode).json({
        error: { code: 'rate_limited', message: 'Too many sign-in attempts. Wait a few minutes, then try again.' },
      });
    },
  });

  router.post(
    '/sign-in',
    publicRoute,
    signInLimiter,
    ...validate({ body: SignInBodySchema }, async ({ body }, req, res) => {
      const user = await verifyCredentials(db, body.email, body.password);
      if (!user) throw new UnauthorizedError(SIGN_IN_FAILED_MESSAGE, 'invalid_credentials');
      await startSession(req, user.id);
      await recordSignIn(db, user);
      res.json({ user: presentCurrentUser(user) });
    }),
  );

  router.post('/sign-out', publicRoute, async (req, res) => {
    await endSession(req);
    res.clearCookie(SESSION_COOKIE, { path: '/' });
    res.status(204).end();
  });

  router.get('/me', requireSignIn, (req, res) => {
    res.json({ user: presentCurrentUser(req.user!) });
  });

  return router;
}
