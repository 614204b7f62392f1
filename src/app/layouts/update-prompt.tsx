import { useEffect } from "react";
import { useRegisterSW } from "virtual:pwa-register/react";
import { Button } from "@/components/ui/button";

const CHECK_EVERY_MS = 60 * 60 * 1000;

/**
 * Lets the waiting version take over, then reloads once it is active. The plugin's own reload
 * waits for a "controlling" event that never comes for a version found by a later update check, or
 * for a page the first service worker never controlled, so the reload is ours.
 */
async function applyUpdate(updateServiceWorker: (reloadPage?: boolean) => Promise<void>) {
  const waiting = (await navigator.serviceWorker.getRegistration())?.waiting;
  // Nothing waiting: the new version already took over (no page was under the old one), so a reload shows it.
  if (!waiting) return window.location.reload();
  let isReloading = false;
  const reload = () => {
    if (isReloading) return;
    isReloading = true;
    window.location.reload();
  };
  navigator.serviceWorker.addEventListener("controllerchange", reload);
  waiting.addEventListener("statechange", () => {
    if (waiting.state === "activated") reload();
  });
  await updateServiceWorker(true);
}

/**
 * Registers the service worker that keeps the app on the device (field mode) and says when a new
 * version is ready. It never reloads by itself: the estimator chooses when, and unsent edits stay
 * on the device either way. Mounted in the signed-in shell only, so a homeowner's visit installs nothing.
 */
export function UpdatePrompt() {
  const {
    needRefresh: [isUpdateReady, setIsUpdateReady],
    updateServiceWorker,
  } = useRegisterSW({
    onRegisteredSW(_url, registration) {
      if (!registration) return;
      // A phone left open in the truck for days still hears about a new version.
      setInterval(() => {
        if (navigator.onLine) void registration.update();
      }, CHECK_EVERY_MS);
    },
  });

  useEffect(() => {
    document.documentElement.dataset["updateReady"] = isUpdateReady ? "true" : "false";
  }, [isUpdateReady]);

  if (!isUpdateReady) return null;
  return (
    <div
      role="status"
      className="fixed inset-x-3 bottom-[calc(theme(spacing.bar)+env(safe-area-inset-bottom)+0.75rem)] z-40 mx-auto max-w-lg rounded-lg border border-ink-600 bg-ink-900 p-4 text-white shadow-xl md:bottom-6"
    >
      <p className="font-semibold">A new version of Eavesight is ready.</p>
      <p className="mt-1 text-sm text-ink-200">Update when it suits you. Anything not sent yet stays on this device.</p>
      <div className="mt-3 flex flex-wrap gap-2">
        <Button onClick={() => void applyUpdate(updateServiceWorker)}>Update now</Button>
        <Button variant="ghost" className="text-white hover:bg-ink-800" onClick={() => setIsUpdateReady(false)}>
          Later
        </Button>
      </div>
    </div>
  );
}
