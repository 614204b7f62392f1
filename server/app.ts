import express, { type Express } from "express";
import helmet from "helmet";
import { existsSync } from "node:fs";
import { sql as rawSql } from "drizzle-orm";
import type { Env } from "./env.ts";
import type { Database } from "./db/client.ts";
import type { Logger } from "./lib/logger.ts";
import type { Jobs } from "./lib/jobs.ts";
import { clientRoutes, compressAnswers } from "./lib/delivery.ts";
import { errorMiddleware } from "./lib/error-middleware.ts";
import { accessLog } from "./lib/access-log.ts";
import { originCheck } from "./lib/csrf.ts";
import { AppError } from "./lib/errors.ts";
import { safeInput } from "./lib/validate.ts";
import { createAudit } from "./lib/audit.ts";
import { requestScopedDb } from "./lib/request-transaction.ts";
import { createsInTransaction } from "./lib/idempotency.ts";
import { createLucia } from "./modules/auth/lucia.ts";
import { sessionMiddleware } from "./modules/auth/session.middleware.ts";
import type { SessionCache } from "./modules/auth/session-cache.ts";
import { createAuthRepository } from "./modules/auth/auth.repository.ts";
import { createAuthService } from "./modules/auth/auth.service.ts";
import { authRouter } from "./modules/auth/auth.router.ts";
import { createTeamRepository } from "./modules/team/team.repository.ts";
import { createTeamService } from "./modules/team/team.service.ts";
import { teamRouter } from "./modules/team/team.router.ts";
import { outboxRouter } from "./modules/outbox/outbox.router.ts";
import { createOutboxRepository } from "./modules/outbox/outbox.repository.ts";
import { createStorage, type Storage } from "./lib/storage/index.ts";
import type { RouteInfo } from "./lib/routes.ts";
import { createCustomersRepository } from "./modules/customers/customers.repository.ts";
import { createCustomersService } from "./modules/customers/customers.service.ts";
import { customersRouter } from "./modules/customers/customers.router.ts";
import { createProjectsRepository } from "./modules/projects/projects.repository.ts";
import { createProjectsService } from "./modules/projects/projects.service.ts";
import { projectsRouter } from "./modules/projects/projects.router.ts";
import { createSpacesRepository } from "./modules/spaces/spaces.repository.ts";
import { createSpacesService } from "./modules/spaces/spaces.service.ts";
import { spacesRouter } from "./modules/spaces/spaces.router.ts";
import { createPhotosRepository } from "./modules/photos/photos.repository.ts";
import { createPhotosService } from "./modules/photos/photos.service.ts";
import { photosRouter } from "./modules/photos/photos.router.ts";
import { createUsersRepository } from "./modules/users/users.repository.ts";
import { createUsersService } from "./modules/users/users.service.ts";
import { usersRouter } from "./modules/users/users.router.ts";
import { createCatalogRepository } from "./modules/catalog/catalog.repository.ts";
import { createCatalogService } from "./modules/catalog/catalog.service.ts";
import { catalogRouter } from "./modules/catalog/catalog.router.ts";
import { createOptionsRepository } from "./modules/options/options.repository.ts";
import { createOptionsService } from "./modules/options/options.service.ts";
import { optionsRouter } from "./modules/options/options.router.ts";
import { createProposalsRepository } from "./modules/proposals/proposals.repository.ts";
import { createProposalsService } from "./modules/proposals/proposals.service.ts";
import { createCompanyService } from "./modules/proposals/company.service.ts";
import { createProposalJobs } from "./modules/proposals/proposal-jobs.ts";
import { proposalsRouter } from "./modules/proposals/proposals.router.ts";
import { publicProposalsRouter, publicRateLimits } from "./modules/proposals/public.router.ts";
import { signatureJson } from "./modules/proposals/uploads.ts";
import { renderChangeOrderPdfOffThread } from "./modules/proposals/pdf/render-off-thread.ts";
import { createChangeOrdersRepository } from "./modules/change-orders/change-orders.repository.ts";
import { createChangeOrdersService } from "./modules/change-orders/change-orders.service.ts";
import { changeOrdersRouter, publicChangeOrdersRouter } from "./modules/change-orders/change-orders.router.ts";
import { createPipelineRepository } from "./modules/pipeline/pipeline.repository.ts";
import { createPipelineService } from "./modules/pipeline/pipeline.service.ts";
import { pipelineRouter } from "./modules/pipeline/pipeline.router.ts";
import { createPaymentProvider, type PaymentProvider } from "./modules/payments/payment-provider.ts";
import { createPaymentsRepository } from "./modules/payments/payments.repository.ts";
import { createPaymentsService } from "./modules/payments/payments.service.ts";
import { PAYMENTS_WEBHOOK_PATH, paymentsRouter, paymentsWebhookBody } from "./modules/payments/payments.router.ts";

export interface AppDeps {
  env: Env;
  db: Database;
  logger: Logger;
  jobs: Jobs;
  /** Folder of the built client, served with an index.html fallback; omitted in API tests. */
  clientDir?: string;
  /** The clock; tests move it to check expiry and lockouts. */
  now?: () => Date;
  /** File storage; by default the driver STORAGE_DRIVER names. */
  storage?: Storage;
  /**
   * Prefix of the shared rate-limit counters. Processes of one deployment share the default;
   * test files each take their own so one file's failed look-ups never limit another's.
   */
  rateLimitNamespace?: string;
  /** The payment provider; by default the `stripe` SDK as PAYMENTS_API_BASE and the keys configure it. */
  paymentProvider?: PaymentProvider | null;
  /** Validated sessions kept briefly for reads (modules/auth/session-cache.ts); without it every request asks the database. */
  sessionCache?: SessionCache;
}

export function createApp(deps: AppDeps): Express {
  const { env, logger } = deps;
  // Repositories see the request's transaction when one is running (creating routes), else the pool.
  const db = requestScopedDb(deps.db);
  const now = deps.now ?? (() => new Date());
  const app = express();
  app.disable("x-powered-by");
  // Whose X-Forwarded-For to believe (client addresses feed the rate limits and the audit trail).
  app.set("trust proxy", /^\d+$/.test(env.TRUST_PROXY) ? Number(env.TRUST_PROXY) : env.TRUST_PROXY);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          imgSrc: ["'self'", "data:", "blob:"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          fontSrc: ["'self'", "data:"],
          connectSrc: ["'self'"],
          frameSrc: ["'self'", "blob:"],
          objectSrc: ["'none'"],
          frameAncestors: ["'self'"],
          upgradeInsecureRequests: null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  app.use(accessLog(logger, { ignore: (url) => url === "/api/health" }));

  app.use(compressAnswers());

  // Links in e-mail come from the configured origin only, never from a request header (server/env.ts).
  const appOrigin = () => env.APP_ORIGIN;
  app.locals.createsInTransaction = createsInTransaction({ db: deps.db, now });
  const audit = createAudit(db);
  const lucia = createLucia(db);
  const authRepo = createAuthRepository(db);
  const authService = createAuthService({ repo: authRepo, lucia, audit, jobs: deps.jobs, appOrigin, now });
  const teamService = createTeamService({
    repo: createTeamRepository(db), audit, jobs: deps.jobs, appOrigin, now,
    companyName: async (id) => (await authRepo.findCompany(id))?.name ?? "your company",
  });
  const storage = deps.storage ?? createStorage(env);
  const projectsRepo = createProjectsRepository(db);
  const spacesRepo = createSpacesRepository(db);
  const photosService = createPhotosService({ repo: createPhotosRepository(db), storage, projects: projectsRepo, spaces: spacesRepo });
  const spacesService = createSpacesService({ repo: spacesRepo, projects: projectsRepo });
  const projectsService = createProjectsService({ repo: projectsRepo, audit });
  const customersService = createCustomersService({ repo: createCustomersRepository(db), audit });
  const usersService = createUsersService({ repo: createUsersRepository(db) });
  const catalogRepo = createCatalogRepository(db);
  const catalogService = createCatalogService({ repo: catalogRepo, audit });
  const optionsService = createOptionsService({ repo: createOptionsRepository(db), projects: projectsRepo, spaces: spacesRepo, catalog: catalogRepo });

  const proposalsRepo = createProposalsRepository(db);
  const proposalJobs = createProposalJobs({ jobs: deps.jobs, repo: proposalsRepo, storage, logger, now, appOrigin, recoveryAfterMs: env.JOBS_RECOVERY_SECONDS * 1_000 });
  const proposalsService = createProposalsService({
    repo: proposalsRepo, projects: projectsRepo, spaces: spacesRepo, options: createOptionsRepository(db), catalog: catalogRepo,
    storage, jobs: proposalJobs, now, appOrigin,
  });
  const companyService = createCompanyService({ repo: proposalsRepo, storage });
  const changeOrdersService = createChangeOrdersService({
    repo: createChangeOrdersRepository(db), proposals: proposalsRepo, catalog: catalogRepo, storage, jobs: proposalJobs, renderPdf: renderChangeOrderPdfOffThread, now, appOrigin: () => appOrigin(),
  });
  app.locals.proposalJobs = proposalJobs;
  const paymentsService = createPaymentsService({
    repo: createPaymentsRepository(db), proposals: proposalsService, provider: deps.paymentProvider === undefined ? createPaymentProvider(env) : deps.paymentProvider,
    jobs: deps.jobs, logger, now, appOrigin,
  });

  const pipelineService = createPipelineService({
    repo: createPipelineRepository(db), now,
    liveOptionTotals: async (actor, projectId) => (await optionsService.list(actor, projectId)).map((o) => ({ id: o.id, totalCents: o.price?.totalCents ?? null })),
  });
  const api = express.Router();
  api.use("/public", ...publicRateLimits({ db, now, namespace: deps.rateLimitNamespace ?? "" }));
  // Routes carrying a drawn signature parse their own (larger) JSON first; the parser below then skips them.
  api.use(["/public/proposals/:token/accept", "/public/change-orders/:token/sign", "/auth/me/signature"], signatureJson());
  // The payment webhook's signature covers the raw bytes: read them before the JSON parser.
  api.use(PAYMENTS_WEBHOOK_PATH, paymentsWebhookBody());
  api.use(express.json({ limit: "1mb" }));
  api.use(originCheck({ allowedOrigins: [env.APP_ORIGIN], exemptPaths: [/^\/webhooks\//] }));
  api.use(safeInput({ exemptPaths: [/^\/webhooks\//] }));

  api.get("/health", async (_req, res) => {
    try {
      await Promise.race([
        db.execute(rawSql`select 1`),
        new Promise((_, reject) => setTimeout(() => reject(new Error("timeout")), 2_000)),
      ]);
      res.json({ status: "ok", database: "reachable" });
    } catch {
      res.status(503).json({ status: "degraded", database: "unreachable" });
    }
  });

  // Staff answers (customers, prices, photos, PDFs) stay out of every cache: offices and trucks share
  // browsers (Decision 6). The homeowner's public routes choose their own caching.
  api.use((req, res, next) => {
    if (!req.path.startsWith("/public/")) res.setHeader("Cache-Control", "no-store");
    next();
  });
  api.use(sessionMiddleware(lucia, now, deps.sessionCache));
  // Declared routes (server/lib/routes.ts): each carries its method, path and access, listed in app.locals.routes.
  const declared = [
    authRouter(authService, lucia), teamRouter(teamService), outboxRouter(createOutboxRepository(db)),
    customersRouter(customersService), projectsRouter(projectsService), spacesRouter(spacesService), photosRouter(photosService), usersRouter(usersService),
    catalogRouter(catalogService), optionsRouter(optionsService), proposalsRouter(proposalsService, companyService), publicProposalsRouter(proposalsService),
    paymentsRouter(paymentsService), pipelineRouter(pipelineService), changeOrdersRouter(changeOrdersService), publicChangeOrdersRouter(changeOrdersService)];
  for (const router of declared) api.use(router);
  app.locals.routes = declared.flatMap((router) => router.routes.map((route): RouteInfo => ({ ...route, path: `/api${route.path}` })));

  api.use((req, _res, next) => next(new AppError("not-found", `No API route ${req.method} ${req.path}.`, 404)));
  app.use("/api", api);

  if (deps.clientDir && existsSync(deps.clientDir)) {
    app.use(clientRoutes(deps.clientDir));
  }

  app.use(errorMiddleware(logger));
  return app;
}
