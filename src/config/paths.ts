/**
 * Every client route in one place. `path` is the router pattern; `getHref` builds a link.
 * The server builds e-mail links to `acceptInvite` and `resetPassword`: keep those two stable.
 */

import { VERIFY_PAGE_PATH } from "@shared/proposals/public-paths";

function withQuery(path: string, query: Record<string, string | undefined>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value) params.set(key, value);
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

/** Messages the sign-in page can show on arrival. */
export type SignInNotice = "signed-out" | "signed-out-everywhere" | "session-ended" | "password-reset";

export const paths = {
  home: { path: "/", getHref: () => "/" },

  auth: {
    signIn: {
      path: "/sign-in",
      /** `next` is where to return after signing in (a path inside the app); `notice` a message to show. */
      getHref: (next?: string, notice?: SignInNotice) => withQuery("/sign-in", { next, notice }),
    },
    forgotPassword: { path: "/forgot-password", getHref: () => "/forgot-password" },
    resetPassword: {
      path: "/reset-password",
      getHref: (token?: string) => withQuery("/reset-password", { token }),
    },
    acceptInvite: {
      path: "/invite/:token",
      getHref: (token: string) => `/invite/${encodeURIComponent(token)}`,
    },
  },

  app: {
    projects: { path: "/projects", getHref: () => "/projects" },
    newProject: {
      path: "/projects/new",
      /** `customerId` starts the form with that customer chosen. */
      getHref: (customerId?: string) => withQuery("/projects/new", { customerId }),
    },
    project: {
      path: "/projects/:projectId",
      getHref: (projectId: string) => `/projects/${encodeURIComponent(projectId)}`,
    },
    projectOptions: {
      path: "/projects/:projectId/options",
      getHref: (projectId: string) => `/projects/${encodeURIComponent(projectId)}/options`,
    },
    projectOptionsCompare: {
      path: "/projects/:projectId/options/compare",
      getHref: (projectId: string) => `/projects/${encodeURIComponent(projectId)}/options/compare`,
    },
    projectOption: {
      path: "/projects/:projectId/options/:optionId",
      getHref: (projectId: string, optionId: string) =>
        `/projects/${encodeURIComponent(projectId)}/options/${encodeURIComponent(optionId)}`,
    },
    projectOptionMaterials: {
      path: "/projects/:projectId/options/:optionId/materials",
      getHref: (projectId: string, optionId: string) =>
        `/projects/${encodeURIComponent(projectId)}/options/${encodeURIComponent(optionId)}/materials`,
    },
    projectProposals: {
      path: "/projects/:projectId/proposals",
      getHref: (projectId: string) => `/projects/${encodeURIComponent(projectId)}/proposals`,
    },
    projectProposal: {
      path: "/projects/:projectId/proposals/:proposalId",
      getHref: (projectId: string, proposalId: string) =>
        `/projects/${encodeURIComponent(projectId)}/proposals/${encodeURIComponent(proposalId)}`,
    },
    customers: { path: "/customers", getHref: () => "/customers" },
    catalog: { path: "/catalog", getHref: () => "/catalog" },
    pipeline: { path: "/pipeline", getHref: () => "/pipeline" },
    settings: {
      root: { path: "/settings", getHref: () => "/settings" },
      profile: { path: "/settings/profile", getHref: () => "/settings/profile" },
      team: { path: "/settings/team", getHref: () => "/settings/team" },
      company: { path: "/settings/company", getHref: () => "/settings/company" },
      outbox: { path: "/settings/outbox", getHref: () => "/settings/outbox" },
    },
  },

  /** The homeowner's proposal page (no account). Built by the proposals work. */
  publicProposal: {
    path: "/p/:token",
    getHref: (token: string) => `/p/${encodeURIComponent(token)}`,
  },

  /** The public document check (no account); the server prints its address on every PDF. */
  publicVerify: {
    path: VERIFY_PAGE_PATH,
    getHref: () => VERIFY_PAGE_PATH,
  },

  /** The homeowner's change-order page (no account). */
  publicChangeOrder: {
    path: "/c/:token",
    getHref: (token: string) => `/c/${encodeURIComponent(token)}`,
  },
} as const;

/** Where a user lands after signing in when no `next` was given. */
export const DEFAULT_SIGNED_IN_PATH = paths.app.projects.getHref();

/**
 * Keeps `next` to a path on this site, so a crafted link can't bounce a user to another origin
 * after sign-in (open-redirect guard), and never loops back to an auth page.
 */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")) {
    return DEFAULT_SIGNED_IN_PATH;
  }
  const authPaths: string[] = [
    paths.auth.signIn.path,
    paths.auth.forgotPassword.path,
    paths.auth.resetPassword.path,
  ];
  const pathname = next.split(/[?#]/)[0] ?? "";
  if (authPaths.includes(pathname) || pathname.startsWith("/invite/")) return DEFAULT_SIGNED_IN_PATH;
  return next;
}
