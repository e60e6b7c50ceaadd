import { Router } from 'express';
import type { DataSource } from 'typeorm';
import {
  PASSWORD_RESET_REQUESTED_MESSAGE,
  PasswordResetCompleteBodySchema,
  PasswordResetRequestBodySchema,
} from '@understudy/shared-types';
import type { AppConfig } from '../../config';
import type { Mailer } from '../../mail/mailer';
import { publicRoute } from '../../middleware/authenticate';
import { validate } from '../../middleware/validate';
import { completePasswordReset, requestPasswordReset } from './password-resets.service';

export function passwordResetsRouter(db: DataSource, mailer: Mailer, config: AppConfig): Router {
  const router = Router();
  router.post(
    '/',
    publicRoute,
    ...validate({ body: PasswordResetRequestBodySchema }, async ({ body }, _req, res) => {
      await requestPasswordReset(db, mailer, config.appUrl, body.email);
      res.status(202).json({ message: PASSWORD_RESET_REQUESTED_MESSAGE });
    }),
  );
  router.post(
    '/complete',
    publicRoute,
    ...validate({ body: PasswordResetCompleteBodySchema }, async ({ body }, _req, res) => {
      await completePasswordReset(db, body.token, body.password);
      res.status(204).end();
    }),
  );
  return router;
}
