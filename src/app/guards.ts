import { onlineManager } from "@tanstack/react-query";
import { data, redirect, type LoaderFunctionArgs } from "react-router";
import { paths, safeNextPath } from "@/config/paths";
import { authQueries } from "@/features/auth/api/queries";
import { canAccess, type Area } from "@/lib/authorization";
import { ensureDeviceCopy } from "@/lib/field/device-copy";
import { queryClient } from "@/lib/query-client";
import type { Session } from "@/lib/session";

function currentPath(request: Request): string {
  const url = new URL(request.url);
  return `${url.pathname}${url.search}`;
}

/**
 * The session, from memory or the device copy when there is one (so the app opens with no signal;
 * it is checked again with the server in the background), else from the server.
 */
export async function currentSession(): Promise<Session | null> {
  await ensureDeviceCopy(queryClient);
  // Once per page load, online, ask the server as before (a name or role may have changed); the
  // device copy stands in only when there is no signal or no answer.
  if (!isSessionChecked && onlineManager.isOnline()) {
    try {
      const session = await queryClient.fetchQuery({ ...authQueries.me(), staleTime: 0, retry: false });
      isSessionChecked = true;
      return session;
    } catch {
      // no answer: fall through to the copy on this device
    }
  }
  return queryClient.ensureQueryData({ ...authQueries.me(), revalidateIfStale: true });
}
let isSessionChecked = false;

async function sessionOrRedirect(request: Request): Promise<Session> {
  const session = await currentSession();
  if (!session) throw redirect(paths.auth.signIn.getHref(currentPath(request)));
  return session;
}

/** Loader for the signed-in app: a signed-out visitor goes to /sign-in?next=<where they were going>. */
export async function requireSession({ request }: LoaderFunctionArgs) {
  await sessionOrRedirect(request);
  return null;
}

/** Loader for a route only some roles may use; others get a friendly 403 page inside the shell. */
export function requireArea(area: Area) {
  return async ({ request }: LoaderFunctionArgs) => {
    const session = await sessionOrRedirect(request);
    if (!canAccess(session.user.role, area)) {
      throw data("Your role doesn't include this page.", { status: 403 });
    }
    return null;
  };
}

/** Loader for /sign-in: someone already signed in goes straight on to `next`. */
export async function redirectIfSignedIn({ request }: LoaderFunctionArgs) {
  let session: Session | null = null;
  try {
    session = await currentSession();
  } catch {
    // Server unreachable: still show the form; signing in will report the problem.
  }
  if (session) throw redirect(safeNextPath(new URL(request.url).searchParams.get("next")));
  return null;
}
