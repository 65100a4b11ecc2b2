import type { NextFunction, Request, Response } from 'express';
import { AppError } from '../errors';

const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * Refuses state-changing requests that a browser marks as coming from another site. SameSite=Lax
 * already keeps the session cookie off cross-site POSTs; this is the second lock (OWASP
 * Cross-Site Request Forgery Prevention Cheat Sheet: verifying origin with standard headers).
 * Requests without Origin (command-line clients, server-to-server) carry no browser cookie risk.
 */
export function sameOrigin(allowed: string[]) {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (!UNSAFE.has(req.method)) return next();
    const origin = req.get('origin');
    const fetchSite = req.get('sec-fetch-site');
    if (fetchSite === 'cross-site' && !origin) throw new AppError(403, 'cross_site', 'Cross-site requests are refused');
    if (!origin) return next();
    const self = `${req.protocol}://${req.get('host')}`;
    if (origin === self || allowed.includes(origin)) return next();
    throw new AppError(403, 'cross_site', `Requests from ${origin} are refused: open Junctura at its own address`);
  };
}
