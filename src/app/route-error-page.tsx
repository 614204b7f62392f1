import { isRouteErrorResponse, Link, useRouteError } from "react-router";
import { Alert } from "@/components/ui/alert";
import { Button, buttonStyles } from "@/components/ui/button";
import { BrandLockup } from "@/components/ui/brand-mark";
import { EmptyState } from "@/components/ui/empty-state";
import { LockIcon, WarningIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { paths } from "@/config/paths";
import { isApiError } from "@/lib/api-client";
import { NotFoundContent } from "./routes/not-found";

function homeLink() {
  return (
    <Link to={paths.app.projects.getHref()} className={buttonStyles({ variant: "secondary" })}>
      Go to projects
    </Link>
  );
}

function ErrorContent() {
  const error = useRouteError();

  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundContent />;
  if ((isRouteErrorResponse(error) && error.status === 403) || (isApiError(error) && error.status === 403)) {
    return (
      <>
        <PageHeader title="Not part of your role" />
        <EmptyState
          icon={<LockIcon />}
          title="You don't have access to this page"
          description="Your company's owner decides who can use each part of Eavesight. Ask them if you need it."
          action={homeLink()}
        />
      </>
    );
  }

  const isOffline = isApiError(error) && error.isNetworkError;
  const detail = error instanceof Error ? error.message : isRouteErrorResponse(error) ? error.statusText : String(error);
  return (
    <>
      <PageHeader title={isOffline ? "Can't reach Eavesight" : "Something went wrong"} />
      <EmptyState
        icon={<WarningIcon />}
        title={isOffline ? "Check your connection" : "This page didn't load"}
        description={
          isOffline
            ? "No signal in the attic? Your work on other pages is safe. Try again when you're back online."
            : "It's not something you did. Try again; if it keeps happening, let your company owner know."
        }
        action={
          <>
            <Button onClick={() => window.location.reload()}>Try again</Button>
            {homeLink()}
          </>
        }
      />
      {import.meta.env.DEV && detail ? (
        <Alert severity="info" title="Details (shown in development only)" className="mt-6">
          <code className="text-sm break-all">{detail}</code>
        </Alert>
      ) : null}
    </>
  );
}

/** errorElement inside the signed-in shell: the header and navigation stay usable. */
export function RouteErrorPage() {
  return <ErrorContent />;
}

/** errorElement at the very top, when even the shell failed. */
export function RootErrorPage() {
  return (
    <div className="min-h-dvh bg-ink-50">
      <div className="mx-auto max-w-reading px-5 py-10 sm:py-16">
        <div className="mb-10">
          <BrandLockup />
        </div>
        <ErrorContent />
      </div>
    </div>
  );
}
