import { paths, type SignInNotice } from "@/config/paths";
import { clearDeviceCopy } from "@/lib/field/device-copy";

/**
 * After signing out, delete the device copy (field mode: kept projects, queued changes and photos,
 * unsent drafts) and load the sign-in page fresh: a full page load drops every cached customer,
 * price and address from memory, which matters on a shared office or truck device.
 */
export async function leaveToSignIn(notice: Extract<SignInNotice, "signed-out" | "signed-out-everywhere">): Promise<void> {
  await clearDeviceCopy();
  window.location.assign(paths.auth.signIn.getHref(undefined, notice));
}
