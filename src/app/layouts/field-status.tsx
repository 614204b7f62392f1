import { useEffect, useId, useRef, useState } from "react";
import { Button } from "@/components/ui/button";
import { cn } from "@/lib/cn";
import { outbox } from "@/lib/field/outbox";
import { useOutbox } from "@/lib/field/use-outbox";
import { useUnsentDraftCount } from "@/lib/field/use-unsent-drafts";
import { waitingSummary } from "@/lib/field/waiting";
import { useIsOnline } from "@/lib/use-is-online";

/**
 * Field mode's indicator in the header: no signal, and what is kept on this device waiting to be
 * sent ("3 changes and 2 photos waiting"). It opens a list of the waiting items; one the server
 * refused says why and offers "Try again" or "Remove": nothing is dropped without being seen.
 */
export function FieldStatus() {
  const isOnline = useIsOnline();
  const { items, sending } = useOutbox();
  const draftCount = useUnsentDraftCount();
  const [isOpen, setIsOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const changeCount = draftCount + items.filter((i) => i.group === "change").length;
  const photoCount = items.filter((i) => i.group === "photo").length;
  const refused = items.filter((i) => i.failure);
  const summary = waitingSummary(changeCount, photoCount);

  useEffect(() => {
    if (!isOpen) return;
    const onPointerDown = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setIsOpen(false);
    };
    const onKeyDown = (event: KeyboardEvent) => event.key === "Escape" && setIsOpen(false);
    document.addEventListener("pointerdown", onPointerDown);
    document.addEventListener("keydown", onKeyDown);
    return () => {
      document.removeEventListener("pointerdown", onPointerDown);
      document.removeEventListener("keydown", onKeyDown);
    };
  }, [isOpen]);

  if (isOnline && !summary) return null;
  const sendingItem = sending ? items.find((i) => i.id === sending.id) : undefined;
  const state = refused.length > 0 ? `${refused.length} not accepted` : !isOnline ? "No signal" : sendingItem ? "Sending…" : summary ? "Waiting to send" : "";

  return (
    <div ref={rootRef} className="relative">
      <button
        type="button"
        aria-expanded={isOpen}
        aria-controls={panelId}
        onClick={() => setIsOpen((open) => !open)}
        className={cn(
          "flex min-h-touch max-w-[11rem] flex-col items-start justify-center rounded-md border px-2.5 py-1 text-left leading-tight sm:max-w-none",
          refused.length > 0 ? "border-critical-200 bg-critical-50 text-critical-800" : !isOnline ? "border-warning-200 bg-warning-50 text-warning-900" : "border-ink-600 bg-ink-800 text-white",
        )}
      >
        <span className="text-xs font-bold tracking-wide uppercase">{state}</span>
        <span role="status" className="text-xs font-medium">
          {summary ?? "All your work is kept on this device"}
        </span>
      </button>
      {isOpen ? (
        <div
          id={panelId}
          className="fixed inset-x-3 top-16 z-30 max-h-[calc(100dvh-9rem)] overflow-y-auto rounded-lg border border-ink-200 bg-white p-4 text-ink-900 shadow-lg md:absolute md:inset-x-auto md:top-auto md:right-0 md:mt-2 md:w-[22rem]"
        >
          <p className="text-sm text-ink-800">
            {isOnline
              ? "Everything below is sent in the order it was made."
              : "No signal. Keep working: what you enter stays on this device and is sent, in order, when the signal returns."}
          </p>
          {draftCount > 0 ? (
            <p className="mt-2 text-sm text-ink-800">
              {draftCount} survey or project edit{draftCount === 1 ? "" : "s"} not sent yet (sent from the project's page).
            </p>
          ) : null}
          {items.length > 0 ? (
            <ul className="mt-3 space-y-2" aria-label="Waiting on this device">
              {items.map((item) => (
                <li key={item.id} className="rounded-md border border-ink-200 p-2.5 text-sm">
                  <p className="font-medium">{item.label}</p>
                  {item.failure ? (
                    <>
                      <p className="mt-1 text-critical-700">Not accepted: {item.failure.message}</p>
                      <div className="mt-2 flex flex-wrap gap-2">
                        <Button size="sm" variant="secondary" onClick={() => void outbox.retry(item.id)}>
                          Try again
                        </Button>
                        <Button size="sm" variant="ghost" className="text-critical-700" onClick={() => void outbox.discard(item.id)}>
                          Remove from this device
                        </Button>
                      </div>
                    </>
                  ) : (
                    <p className="mt-1 text-ink-600">
                      {sending?.id === item.id
                        ? sending.progress !== null
                          ? `Uploading, ${Math.round(sending.progress * 100)}%`
                          : "Sending…"
                        : item.after.length > 0 && isOnline
                          ? "Waits until its survey is saved"
                          : "Waiting"}
                    </p>
                  )}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
