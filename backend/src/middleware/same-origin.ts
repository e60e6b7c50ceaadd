import type { NextFunction, Request, Response } from 'express';
import { ForbiddenRequestError } from '../errors';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing requests started by another site. Browsers send Sec-Fetch-Site and Origin;
 * we accept "same-origin" and "none" (typed in the address bar), and an Origin only if it is ours.
 * Clients that send neither (curl, scripts) cannot ride a visitor's cookies, so they pass.
 */
export function rejectCrossSite(allowedOrigins: string[]) {
  const allowed = new Set(allowedOrigins);
  return (req: Request, _res: Response, next: NextFunction) => {
    if (SAFE_METHODS.has(req.method)) return next();
    const fetchSite = req.get('sec-fetch-site');
    if (fetchSite && fetchSite !== 'same-origin' && fetchSite !== 'none') {
      return next(new ForbiddenRequestError('Requests from other sites are refused.', 'cross_site_request'));
    }
    const origin = req.get('origin');
    if (origin && origin !== 'null') {
      const ownOrigin = `${req.protocol}://${req.get('host')}`;
      if (origin !== ownOrigin && !allowed.has(origin)) {
        return next(new ForbiddenRequestError('Requests from other sites are refused.', 'cross_site_request'));
      }
    } else if (origin === 'null') {
      return next(new ForbiddenRequestError('Requests from other sites are refused.', 'cross_site_request'));
    }
    next();
  };
}
