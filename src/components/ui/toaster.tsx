import { Toaster as SonnerToaster } from "sonner";

export { toast } from "sonner";

/**
 * Toasts for confirmations ("Invite sent") and background failures. Anything the user must act on
 * belongs in the page (an Alert or a field error), not only in a toast.
 */
export function Toaster() {
  return (
    <SonnerToaster
      position="top-center"
      closeButton
      richColors={false}
      offset={16}
      mobileOffset={{ top: 12 }}
      toastOptions={{
        classNames: {
          toast:
            "!font-sans !rounded-lg !border !border-ink-200 !bg-white !text-ink-900 !shadow-raised !text-base !gap-3 !px-4 !py-3.5",
          title: "!font-semibold !text-base",
          description: "!text-ink-700 !text-sm",
          success: "[&_[data-icon]]:!text-ok-600",
          error: "!border-critical-200 [&_[data-icon]]:!text-critical-600",
          warning: "[&_[data-icon]]:!text-warning-600",
          info: "[&_[data-icon]]:!text-info-600",
          closeButton: "!border-ink-300 !bg-white !text-ink-700",
        },
      }}
    />
  );
}
