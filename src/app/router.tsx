import { onlineManager } from "@tanstack/react-query";
import { createBrowserRouter, redirect, type RouteObject } from "react-router";
import { paths } from "@/config/paths";
import { redirectIfSignedIn, requireArea, requireSession } from "./guards";
import { surveyQueries } from "@/features/survey/api/queries";
import { ensureDeviceCopy } from "@/lib/field/device-copy";
import { queryClient } from "@/lib/query-client";
import { authQueries } from "@/features/auth/api/queries";
import { canAccess } from "@/lib/authorization";
import { AuthLayout } from "./layouts/auth-layout";
import { FullPageLoading, RootLayout } from "./layouts/root-layout";
import { RootErrorPage, RouteErrorPage } from "./route-error-page";
import { Component as NotFoundRoute } from "./routes/not-found";

/*
 * Pages load lazily from app/routes/* (each module exports `Component`), so later work fills a
 * route in without touching this file beyond its entry. Role guards are loaders here, next to the
 * path, so who-may-open-what reads in one place (rules: lib/authorization.ts).
 */
const appRoutes: RouteObject[] = [
  {
    index: true,
    // The crew has no project list: it lands on its jobs.
    loader: async () => {
      const session = await queryClient.ensureQueryData(authQueries.me());
      return redirect(session && !canAccess(session.user.role, "projects") ? paths.app.jobs.getHref() : paths.app.projects.getHref());
    },
  },
  {
    path: paths.app.projects.path,
    loader: requireArea("projects"),
    lazy: () => import("./routes/projects"),
  },
  {
    path: paths.app.newProject.path,
    loader: requireArea("projects"),
    lazy: () => import("./routes/projects-new"),
  },
  {
    path: paths.app.project.path,
    // The project is asked for together with the page's code and the session, not after the code runs.
    loader: async (args) => {
      await ensureDeviceCopy(queryClient);
      const options = surveyQueries.project(args.params.projectId ?? "");
      // Online, the workspace starts from the server's copy (the device's may be behind, and edits
      // based on it would meet a conflict); with no signal, or none reaching the server, from the device's.
      const fresh = onlineManager.isOnline() ? queryClient.fetchQuery({ ...options, staleTime: 0, retry: false }).catch(() => undefined) : undefined;
      await requireArea("projects")(args);
      await fresh;
      return null;
    },
    lazy: () => import("./routes/projects-detail"),
  },
  {
    path: paths.app.projectOptions.path,
    loader: requireArea("projects"),
    lazy: () => import("./routes/project-options"),
  },
  {
    path: paths.app.projectOptionsCompare.path,
    loader: requireArea("projects"),
    lazy: () => import("./routes/project-options-compare"),
  },
  {
    path: paths.app.projectOption.path,
    loader: requireArea("projects"),
    lazy: () => import("./routes/project-options-edit"),
  },
  {
    path: paths.app.projectOptionMaterials.path,
    loader: requireArea("projects"),
    lazy: () => import("./routes/project-options-materials"),
  },
  {
    path: paths.app.projectProposals.path,
    loader: requireArea("projects"),
    lazy: () => import("./routes/project-proposals"),
  },
  {
    path: paths.app.projectProposal.path,
    loader: requireArea("projects"),
    lazy: () => import("./routes/project-proposal"),
  },
  {
    path: paths.app.customers.path,
    loader: requireArea("customers"),
    lazy: () => import("./routes/customers"),
  },
  {
    path: paths.app.catalog.path,
    loader: requireArea("catalog"),
    lazy: () => import("./routes/catalog"),
  },
  {
    path: paths.app.pipeline.path,
    loader: requireArea("pipeline"),
    lazy: () => import("./routes/pipeline"),
  },
  {
    path: paths.app.jobs.path,
    loader: requireArea("jobs"),
    lazy: () => import("./routes/jobs"),
  },
  {
    path: paths.app.job.path,
    loader: requireArea("jobs"),
    lazy: () => import("./routes/job"),
  },
  {
    path: paths.app.settings.root.path,
    lazy: () => import("./layouts/settings-layout").then(({ SettingsLayout }) => ({ Component: SettingsLayout })),
    children: [
      { index: true, loader: () => redirect(paths.app.settings.profile.getHref()) },
      {
        path: paths.app.settings.profile.path,
        loader: requireArea("profile"),
        lazy: () => import("./routes/settings/profile"),
      },
      {
        path: paths.app.settings.team.path,
        loader: requireArea("team"),
        lazy: () => import("./routes/settings/team"),
      },
      {
        path: paths.app.settings.company.path,
        loader: requireArea("company"),
        lazy: () => import("./routes/settings/company"),
      },
      {
        path: paths.app.settings.outbox.path,
        loader: requireArea("outbox"),
        lazy: () => import("./routes/settings/outbox"),
      },
    ],
  },
  { path: "*", Component: NotFoundRoute },
];

export const routes: RouteObject[] = [
  {
    element: <RootLayout />,
    errorElement: <RootErrorPage />,
    HydrateFallback: FullPageLoading,
    children: [
      // The homeowner's proposal page: no account and no app shell (it has its own plain header).
      { path: paths.publicProposal.path, errorElement: <RootErrorPage />, lazy: () => import("./routes/public-proposal") },
      { path: paths.publicChangeOrder.path, errorElement: <RootErrorPage />, lazy: () => import("./routes/public-change-order") },
      { path: paths.publicCompletion.path, errorElement: <RootErrorPage />, lazy: () => import("./routes/public-completion") },
      { path: paths.publicVerify.path, errorElement: <RootErrorPage />, lazy: () => import("./routes/public-verify") },
      {
        element: <AuthLayout />,
        errorElement: <RootErrorPage />,
        children: [
          { path: paths.auth.signIn.path, loader: redirectIfSignedIn, lazy: () => import("./routes/auth/sign-in") },
          { path: paths.auth.forgotPassword.path, lazy: () => import("./routes/auth/forgot-password") },
          { path: paths.auth.resetPassword.path, lazy: () => import("./routes/auth/reset-password") },
          { path: paths.auth.acceptInvite.path, lazy: () => import("./routes/auth/accept-invite") },
        ],
      },
      {
        id: "app",
        loader: requireSession,
        // The signed-in shell (navigation, menus, dialogs) is not part of the sign-in page's code.
        lazy: () => import("./layouts/app-layout").then(({ AppLayout }) => ({ Component: AppLayout })),
        children: [{ errorElement: <RouteErrorPage />, children: appRoutes }],
      },
    ],
  },
];

export const router = createBrowserRouter(routes);
