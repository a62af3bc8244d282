import { existsSync } from 'node:fs';
import path from 'node:path';
import express, { type Express } from 'express';
import session from 'express-session';
import { RequestContext } from '@mikro-orm/core';
import type { Orm } from './db.js';
import { apiNotFound, errorHandler, type Logger } from './middleware/error-handler.js';
import { createPassport } from './modules/auth/auth.passport.js';
import { authRoutes } from './modules/auth/auth.routes.js';
import { AuthService } from './modules/auth/auth.service.js';
import type { RateLimitOptions } from './modules/auth/rate-limit.js';
import { buildRoutes } from './modules/builds/builds.routes.js';
import { BuildsService } from './modules/builds/builds.service.js';
import { cutPlanRoutes } from './modules/cut-plans/cut-plans.routes.js';
import { CutPlansService } from './modules/cut-plans/cut-plans.service.js';
import { designRoutes } from './modules/designs/designs.routes.js';
import { DesignsService } from './modules/designs/designs.service.js';
import { exportRoutes } from './modules/exports/exports.routes.js';
import { nestJobRoutes } from './modules/nest-jobs/nest-jobs.routes.js';
import { NestJobsService } from './modules/nest-jobs/nest-jobs.service.js';
import { memberRoutes } from './modules/workshops/workshops.routes.js';
import { workshopRoutes } from './modules/workshops/workshop-settings.routes.js';
import { WorkshopSettingsService } from './modules/workshops/workshop-settings.service.js';
import { WorkshopsService } from './modules/workshops/workshops.service.js';
import { createNullMailer, type Mailer } from './mail/mailer.js';
import type { PublicUrl } from './mail/links.js';
import { auditRoutes } from './modules/audit/audit.routes.js';
import { AuditService } from './modules/audit/audit.service.js';
import { invitationAdminRoutes, invitationLinkRoutes } from './modules/invitations/invitations.routes.js';
import { InvitationsService } from './modules/invitations/invitations.service.js';
import { mailRoutes } from './modules/mail/mail.routes.js';
import { MailService } from './modules/mail/mail.service.js';
import { passwordResetRoutes, type ResetLimit } from './modules/password-reset/password-reset.routes.js';
import { PasswordResetService } from './modules/password-reset/password-reset.service.js';
import { stockRoutes } from './modules/stock/stock.routes.js';
import { StockService } from './modules/stock/stock.service.js';
import { uploadRoutes } from './modules/uploads/uploads.routes.js';
import { UploadsService } from './modules/uploads/uploads.service.js';
import { MemoryStorage, type FileStorage } from './storage/storage.js';
import { checklistRoutes } from './modules/checklist/checklist.routes.js';
import { ChecklistService } from './modules/checklist/checklist.service.js';
import { shareLinkAdminRoutes, sharedPlanRoutes } from './modules/share-links/share-links.routes.js';
import { ShareLinksService } from './modules/share-links/share-links.service.js';
import './session-user.js';

export const SESSION_COOKIE = 'boxwright.sid';
const SESSION_MAX_AGE_MS = 14 * 24 * 60 * 60 * 1000;

export interface AppDeps {
  orm: Orm;
  sessionStore: session.Store;
  /** Signs the session cookie; several for rotation (the first signs). */
  sessionSecret: string | string[];
  /** Secure cookies (HTTPS only). Off for plain http on localhost. */
  secureCookies?: boolean;
  /** Express `trust proxy` setting, when behind a reverse proxy (client addresses for rate limits). */
  trustProxy?: boolean | number | string;
  loginLimit?: RateLimitOptions;
  signupLimit?: RateLimitOptions;
  /** The built client (dist/client); null serves the API only. */
  clientDir?: string | null;
  logger?: Logger;
  /** Sends e-mail (server/start.ts: SMTP_URL or the local catcher); default: delivers nothing. */
  mailer?: Mailer;
  /** Where people open links sent by e-mail (PUBLIC_URL); never taken from the request. */
  publicUrl?: PublicUrl;
  /** Uploaded files; default in memory (server/start.ts passes local disk). */
  storage?: FileStorage;
  resetLimit?: ResetLimit;
}

/** Builds the Express app: JSON API under /api, then the built client with its SPA fallback. */
export function createApp(deps: AppDeps): Express {
  const { orm } = deps;
  const logger = deps.logger ?? console;
  const app = express();
  app.disable('x-powered-by');
  if (deps.trustProxy !== undefined) app.set('trust proxy', deps.trustProxy);

  // Services take the global em; inside a request it resolves to that request's RequestContext fork.
  const auth = new AuthService(orm.em);
  const workshops = new WorkshopsService(orm.em);
  const designs = new DesignsService(orm.em);
  const builds = new BuildsService(orm.em);
  const cutPlans = new CutPlansService(orm.em);
  const nestJobs = new NestJobsService(orm.em, cutPlans, logger);
  const mail = new MailService(orm.em, deps.mailer ?? createNullMailer(), logger);
  const publicUrl = deps.publicUrl ?? (() => 'http://localhost:3000');
  const stock = new StockService(orm.em);
  const audit = new AuditService(orm.em);
  const storage = deps.storage ?? new MemoryStorage();
  const uploads = new UploadsService(orm.em, storage, stock);
  const workshopSettings = new WorkshopSettingsService(orm.em, storage, logger, nestJobs);
  const invitations = new InvitationsService(orm.em, mail, publicUrl);
  const resets = new PasswordResetService(orm.em, mail, publicUrl, logger);
  const checklist = new ChecklistService(orm.em, stock);
  const shareLinks = new ShareLinksService(orm.em, cutPlans, mail, publicUrl);
  const passport = createPassport(auth);
  const roleLookup = workshops.roleOf.bind(workshops);

  const api = express.Router();
  api.use(express.json({ limit: '1mb' }));
  api.use(
    session({
      name: SESSION_COOKIE,
      store: deps.sessionStore,
      secret: deps.sessionSecret,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: deps.secureCookies ?? false, maxAge: SESSION_MAX_AGE_MS, path: '/' },
    }),
  );
  api.use((_req, _res, next) => RequestContext.create(orm.em, next));
  api.use(passport.initialize());
  api.use(passport.session());

  api.get('/health', (_req, res) => {
    res.json({ ok: true });
  });
  api.use(
    '/auth',
    authRoutes({ auth, passport, sessionCookieName: SESSION_COOKIE, loginLimit: deps.loginLimit, signupLimit: deps.signupLimit }),
  );
  api.use('/workshops/:wid/members', memberRoutes(workshops));
  api.use('/workshops', workshopRoutes(workshopSettings, roleLookup));
  api.use('/workshops/:wid/designs', designRoutes(designs, roleLookup));
  api.use('/workshops/:wid/builds', buildRoutes(builds, roleLookup));
  api.use('/workshops/:wid/nest-jobs', nestJobRoutes(nestJobs, roleLookup));
  api.use('/workshops/:wid/cut-plans/:planId/checklist', checklistRoutes(checklist, roleLookup));
  api.use('/workshops/:wid/cut-plans/:planId/share-links', shareLinkAdminRoutes(shareLinks, roleLookup));
  api.use('/share', sharedPlanRoutes(shareLinks));
  api.use('/workshops/:wid/cut-plans/:id/exports', exportRoutes(cutPlans, roleLookup));
  api.use('/workshops/:wid/cut-plans', cutPlanRoutes(cutPlans, roleLookup));
  api.use('/workshops/:wid/stock', stockRoutes(stock, uploads, roleLookup));
  api.use('/workshops/:wid/history', auditRoutes(audit, roleLookup));
  api.use('/workshops/:wid/mail', mailRoutes(mail, roleLookup));
  api.use('/workshops/:wid/invitations', invitationAdminRoutes(invitations, roleLookup));
  api.use('/workshops/:wid/uploads', uploadRoutes(uploads, roleLookup));
  api.use('/invitations', invitationLinkRoutes(invitations, (id) => auth.sessionUser(id)));
  api.use('/password-reset', passwordResetRoutes(resets, deps.resetLimit));
  api.use(apiNotFound);
  api.use(errorHandler(logger));
  app.use('/api', api);

  const clientDir = deps.clientDir ?? null;
  const indexHtml = clientDir ? path.join(clientDir, 'index.html') : null;
  if (clientDir && indexHtml && existsSync(indexHtml)) {
    app.use(
      express.static(clientDir, {
        index: false,
        setHeaders: (res, file) => {
          // Vite names built assets by content hash: cache them for good.
          if (file.includes(`${path.sep}assets${path.sep}`)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        },
      }),
    );
    // Every other GET is a client route (Express 5 / path-to-regexp 8 syntax, STACK.md trap 7).
    app.get('/{*splat}', (_req, res) => {
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(indexHtml);
    });
  }
  app.use(errorHandler(logger));
  return app;
}
