import type { NextFunction, Request, Response } from 'express';
import type { DataSource } from 'typeorm';
import { defineAbilityFor, type Action, type AppAbility, type AppSubject } from '@understudy/shared-types';
import { UserEntity, type User } from '../entities';
import { ForbiddenRequestError, UnauthorizedError } from '../errors';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
  }
}

declare module 'express-serve-static-core' {
  interface Request {
    user?: User;
    ability: AppAbility;
  }
}

/**
 * Loads the signed-in person on every request (so a disabled account or a changed role takes
 * effect at once) and builds their CASL ability.
 */
export function loadCurrentUser(dataSource: DataSource) {
  const users = dataSource.getRepository(UserEntity);
  return async (req: Request, _res: Response, next: NextFunction) => {
    const userId = req.session?.userId;
    if (userId) {
      const user = await users.findOneBy({ id: userId });
      if (user && !user.disabled) req.user = user;
      else delete req.session.userId;
    }
    req.ability = defineAbilityFor(req.user ?? null);
    next();
  };
}

/** 401 when signed out. */
export function requireSignIn(req: Request, _res: Response, next: NextFunction) {
  if (!req.user) return next(new UnauthorizedError());
  next();
}

/** 401 when signed out, 403 when the role cannot do `action` on `subject` at all. */
export function authorize(action: Action, subject: AppSubject) {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (!req.user) return next(new UnauthorizedError());
    if (req.ability.cannot(action, subject)) return next(new ForbiddenRequestError());
    next();
  };
}

/** Marks a route as deliberately open to everyone, so the pipeline says so; the role matrix checks it. */
export function publicRoute(_req: Request, _res: Response, next: NextFunction) {
  next();
}
