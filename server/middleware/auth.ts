import type { NextFunction, Request, Response } from 'express';
import type { Db } from '../db';
import { AppError } from '../errors';
import { sessionView, type SessionView } from '../services/auth-service';

export type AuthLocals = { auth: SessionView };

/** Resolves the signed-in user and their memberships into `res.locals.auth`, or answers 401. */
export function requireAuth(db: Db) {
  return async (req: Request, res: Response, next: NextFunction) => {
    const userId = req.session.userId;
    if (!userId) throw AppError.unauthenticated();
    const view = await sessionView(db, userId);
    if (!view) {
      await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
      throw AppError.unauthenticated();
    }
    res.locals.auth = view;
    next();
  };
}

export function authOf(res: Response): SessionView {
  return (res.locals as AuthLocals).auth;
}
