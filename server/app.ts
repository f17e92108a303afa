// createApp builds the Express app from its parts; it never listens (tests drive it in-process).
import { fileURLToPath } from 'node:url';
import express, { type Express } from 'express';
import helmet from 'helmet';
import type { Knex } from 'knex';
import type { Config } from './config.ts';
import { requireJsonBody } from './http/content-type.ts';
import { apiNotFound, errorHandler } from './http/error-handler.ts';
import { originCheck } from './http/origin-check.ts';
import { createLucia, sessionMiddleware } from './http/session.ts';
import { serveClient } from './http/static-client.ts';
import { authRoutes } from './modules/auth/auth.routes.ts';
import { shopsRoutes } from './modules/auth/shops.routes.ts';
import { createAuthService } from './modules/auth/auth.service.ts';
import { healthRoutes } from './modules/health/health.routes.ts';
import { createRepositories, type LibraryDeps } from './modules/library-deps.ts';
import type { Mailbox } from './modules/mail/fake-smtp.ts';
import { createOutbox, smtpTransport, type Outbox } from './modules/mail/outbox.ts';
import { patternsRoutes } from './modules/patterns/patterns.routes.ts';
import { createPatternsService } from './modules/patterns/patterns.service.ts';
import { createRevisionsService } from './modules/revisions/revisions.service.ts';
import type { Transporter } from 'nodemailer';
import { devMailApiRoutes, devMailPage } from './modules/dev-mail/dev-mail.routes.ts';
import { invitesRoutes } from './modules/invites/invites.routes.ts';
import { createInvitesService } from './modules/invites/invites.service.ts';
import { membersRoutes } from './modules/members/members.routes.ts';
import { createMembersService } from './modules/members/members.service.ts';
import { settingsRoutes } from './modules/settings/settings.routes.ts';
import { downloadsRoutes } from './modules/downloads/downloads.routes.ts';
import { trialPrintRoutes } from './modules/downloads/trial-print.routes.ts';
import { thumbnailRoutes } from './modules/downloads/thumbnail.routes.ts';
import { compareRoutes } from './modules/compare/compare.routes.ts';
import { transferRoutes } from './modules/transfer/transfer.routes.ts';
import { createTransferService } from './modules/transfer/transfer.service.ts';
import { shareRoutes } from './modules/share/share.routes.ts';
import { createShareService } from './modules/share/share.service.ts';
import { printJobsRoutes } from './modules/downloads/print-jobs.routes.ts';
import { createPrintJobsService, type PrintRunner } from './modules/downloads/print-jobs.service.ts';
import type { PrintJobLimits } from './modules/downloads/print-job-table.ts';
import type { FileStore } from './modules/storage/file-store.ts';
import { fileStoreFor } from './modules/storage/choose-file-store.ts';
import { ordersModule } from './modules/orders/orders-module.ts';
import { standardsRoutes } from './modules/standards/standards.routes.ts';
import { createStandardsService } from './modules/standards/standards.service.ts';

export interface AppDeps {
  db: Knex;
  config: Config;
  /** Folder of the built client; default dist/client. Served only when it holds index.html. */
  clientDir?: string;
  /** Where unexpected errors are logged (default console.error). */
  log?: (err: unknown) => void;
  /** Outgoing mail: a nodemailer transport (default from config.smtp) and, in development
   * and tests, the fake SMTP server's mailbox shown at /dev/mail. */
  mail?: { transport?: Transporter; mailbox?: Mailbox };
  /** Bounds of the in-memory print-job table (queue size, lifetimes); defaults suit a shop. */
  printJobs?: Partial<PrintJobLimits>;
  /** What renders a posted print job (default the print worker); tests hold jobs in the queue with it. */
  printRunner?: PrintRunner;
  /** Where uploaded photos live (default: S3_BUCKET when set, else the disk under config.uploadDir). */
  fileStore?: FileStore;
  /** The clock of the orders side (measuring-link expiry, order times); tests move it. */
  now?: () => number;
}

/** What createApp exposes beside the app (tests flush mail through it). */
export interface AppInternals {
  outbox: Outbox;
  mailbox: Mailbox | undefined;
}

/** The internals of an app made by createApp. */
export const internalsOf = (app: Express) => app.locals.latchet as AppInternals;

/** Default location of the client build. */
export const CLIENT_DIR = fileURLToPath(new URL('../dist/client', import.meta.url));

export function createApp({ db, config, fileStore, now, clientDir = CLIENT_DIR, log, mail, printJobs, printRunner }: AppDeps): Express {
  const app = express();
  app.set('trust proxy', config.trustProxy);
  app.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        // Only our own origin: the SPA's bundled scripts, styles and self-hosted fonts;
        // data:/blob: images for previews and downloads. No outside host anywhere.
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          scriptSrcAttr: ["'none'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'", 'data:'],
          imgSrc: ["'self'", 'data:', 'blob:'],
          connectSrc: ["'self'"],
          workerSrc: ["'self'", 'blob:'],
          objectSrc: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
          frameAncestors: ["'self'"],
        },
      },
    }),
  );

  const repos = createRepositories(db);
  const authRepo = repos.auth;
  const lucia = createLucia(authRepo, config);
  const authService = createAuthService(db, authRepo, lucia);
  const outbox = createOutbox(db, mail?.transport ?? smtpTransport(config), config.mailFrom);
  const deps: LibraryDeps = { db, config, outbox, repos };
  const internals: AppInternals = { outbox, mailbox: mail?.mailbox };
  app.locals.latchet = internals;

  const api = express.Router();
  api.use(originCheck(config.publicOrigin));
  api.use(requireJsonBody());
  api.use(express.json({ limit: config.jsonLimitBytes }));
  const session = sessionMiddleware(lucia, authRepo, config);
  api.use(session);
  api.use((_req, res, next) => {
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  api.use(healthRoutes(db));
  api.use(authRoutes(authService, lucia, config));
  api.use(shopsRoutes(authRepo, authService, lucia));
  const revisions = createRevisionsService(deps);
  const patterns = createPatternsService(deps);
  // Import first: '/patterns/import' must not be read as '/patterns/:id'.
  api.use(transferRoutes(createTransferService(deps), patterns, config));
  api.use(patternsRoutes(patterns, revisions));
  api.use(downloadsRoutes(deps, revisions));
  api.use(trialPrintRoutes(deps));
  api.use(thumbnailRoutes(deps, revisions));
  api.use(compareRoutes(deps));
  const shares = createShareService(deps, repos.shares);
  api.use(shareRoutes(shares));
  api.use(printJobsRoutes(deps, revisions, shares, createPrintJobsService(printJobs, log ?? ((e) => console.error(e)), printRunner)));
  api.use(membersRoutes(createMembersService(db, repos.members, repos.audit)));
  api.use(invitesRoutes(createInvitesService(deps, repos.invites, repos.members), { service: authService, repo: authRepo, lucia }, config));
  api.use(settingsRoutes(repos.follows));
  api.use(standardsRoutes(createStandardsService(db)));
  api.use(ordersModule({ ...deps, now: now ?? Date.now, fileStore: fileStore ?? fileStoreFor(config) }));
  // The development mailbox exists only outside production and only with a fake SMTP server.
  const mailbox = config.env !== 'production' ? mail?.mailbox : undefined;
  if (mailbox) api.use(devMailApiRoutes(mailbox));
  api.use(apiNotFound);
  app.use('/api', api);

  if (mailbox) app.use(originCheck(config.publicOrigin), devMailPage(mailbox, session));
  serveClient(app, clientDir);
  app.use(errorHandler(log));
  return app;
}
