import type { Request, RequestHandler, Response } from 'express';
import { can, type Permission, type Role } from '../../shared/schemas/api.schema.js';
import { AppError } from '../errors.js';
import type { SessionUser } from '../session-user.js';

/** 401 unless signed in. */
export const requireUser: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : AppError.unauthenticated());
};

/** The signed-in user of a request that passed `requireUser`. */
export function userOf(req: Request): SessionUser {
  if (!req.user) throw AppError.unauthenticated();
  return req.user;
}

/** Parses a positive integer route parameter; anything else is an unknown resource (404). */
export function idParam(req: Request, name: string): number {
  const raw = req.params[name];
  if (typeof raw !== 'string' || !/^[1-9]\d{0,9}$/.test(raw)) throw AppError.notFound();
  const id = Number(raw);
  if (id > 2_147_483_647) throw AppError.notFound();
  return id;
}

export interface WorkshopAccess {
  workshopId: number;
  role: Role;
}

export type RoleLookup = (userId: number, workshopId: number) => Promise<Role | null>;

/**
 * Signed in, a member of the workshop `:wid` (else 403), and — when `permission` is given — a role that
 * has it (PERMISSIONS in shared/schemas/api.schema.ts; else 403). Puts the access on `res.locals`.
 */
export function requireRole(lookup: RoleLookup, permission?: Permission): RequestHandler {
  return async (req, res, next) => {
    const user = userOf(req);
    const workshopId = idParam(req, 'wid');
    const role = await lookup(user.id, workshopId);
    if (!role) throw AppError.forbidden('You are not a member of this workshop.');
    if (permission && !can(role, permission)) throw AppError.forbidden();
    const access: WorkshopAccess = { workshopId, role };
    res.locals.access = access;
    next();
  };
}

/** The workshop access `requireRole` checked for this request. */
export function accessOf(res: Response): WorkshopAccess {
  const access = res.locals.access as WorkshopAccess | undefined;
  if (!access) throw new Error('requireRole must run before accessOf');
  return access;
}
