import type { UnitSystem } from '../shared/schemas/api.schema.js';

/** What passport puts on `req.user` for a signed-in request (loaded fresh from the DB on every request). */
export interface SessionUser {
  id: number;
  email: string;
  units: UnitSystem;
  /** The account's session version when this was read (server only; never sent to the client). */
  sessionVersion: number;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}
