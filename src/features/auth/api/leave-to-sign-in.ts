import { paths, type SignInNotice } from "@/config/paths";

/**
 * After signing out, load the sign-in page fresh: a full page load drops every cached customer,
 * price and address from memory, which matters on a shared office or truck device.
 */
export function leaveToSignIn(notice: Extract<SignInNotice, "signed-out" | "signed-out-everywhere">): void {
  window.location.assign(paths.auth.signIn.getHref(undefined, notice));
}
