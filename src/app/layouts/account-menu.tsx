import { useEffect, useId, useRef, useState } from "react";
import { Link } from "react-router";
import { Badge } from "@/components/ui/badge";
import { ConfirmDialog } from "@/components/ui/dialog";
import { ChevronDownIcon, LockIcon, SignOutIcon, UserIcon } from "@/components/ui/icons";
import { Spinner } from "@/components/ui/spinner";
import { toast } from "@/components/ui/toaster";
import { paths } from "@/config/paths";
import { useSignOut } from "@/features/auth/api/sign-out";
import { useSignOutEverywhere } from "@/features/auth/api/sign-out-everywhere";
import { ROLE_LABELS } from "@/lib/authorization";
import { cn } from "@/lib/cn";
import { useOutbox } from "@/lib/field/use-outbox";
import { useUnsentDraftCount } from "@/lib/field/use-unsent-drafts";
import { waitingSummary } from "@/lib/field/waiting";
import { useSession } from "@/lib/session";

function initials(name: string, email: string): string {
  const source = name.trim() || email;
  const parts = source.split(/\s+/).filter(Boolean);
  const letters = parts.length > 1 ? `${parts[0]?.[0] ?? ""}${parts.at(-1)?.[0] ?? ""}` : source.slice(0, 2);
  return letters.toUpperCase();
}

const itemStyles =
  "flex w-full min-h-touch items-center gap-3 rounded-md px-3 text-left text-base font-medium text-ink-800 hover:bg-ink-100 disabled:opacity-60";

/**
 * The signed-in person and company, with sign-out. A disclosure (button + panel), not an ARIA
 * menu: it holds a link and two buttons, all reachable with Tab; Escape or a click outside closes it.
 */
export function AccountMenu() {
  const { user, company } = useSession();
  const [isOpen, setIsOpen] = useState(false);
  const [isConfirmingEverywhere, setIsConfirmingEverywhere] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const buttonRef = useRef<HTMLButtonElement>(null);
  const signOut = useSignOut();
  const signOutEverywhere = useSignOutEverywhere();

  useEffect(() => {
    if (!isOpen) return;
    const onPointerDown = (event: PointerEvent) => {
      if (!rootRef.current?.contains(event.target as Node)) setIsOpen(false);
    };
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.key === "Escape") {
        setIsOpen(false);
        buttonRef.current?.focus();
      }
    };
    document.addEventListener("pointerdown", onPointerDown);
    document.addEventListener("keydown", onKeyDown);
    return () => {
      document.removeEventListener("pointerdown", onPointerDown);
      document.removeEventListener("keydown", onKeyDown);
    };
  }, [isOpen]);

  const { items } = useOutbox();
  const draftCount = useUnsentDraftCount();
  const waiting = waitingSummary(draftCount + items.filter((i) => i.group === "change").length, items.filter((i) => i.group === "photo").length);
  const [isConfirmingLoss, setIsConfirmingLoss] = useState(false);
  const signOutNow = () =>
    signOut.mutate(undefined, {
      onError: (error) => toast.error("Couldn't sign out", { description: error.message }),
    });
  // Signing out deletes the device copy: say so first when work on it has not been sent.
  const onSignOut = () => {
    if (waiting) {
      setIsOpen(false);
      setIsConfirmingLoss(true);
    } else signOutNow();
  };

  return (
    <div ref={rootRef} className="relative">
      <button
        ref={buttonRef}
        type="button"
        aria-expanded={isOpen}
        aria-controls={panelId}
        onClick={() => setIsOpen((open) => !open)}
        className="flex h-touch items-center gap-2.5 rounded-md px-1.5 text-left text-white hover:bg-ink-800 md:px-2.5"
      >
        <span
          aria-hidden="true"
          className="flex size-9 items-center justify-center rounded-full bg-ember-500 text-sm font-bold text-ink-950"
        >
          {initials(user.name, user.email)}
        </span>
        {/* Hidden from screen readers: the sr-only line below names the button once, with these words in it. */}
        <span aria-hidden="true" className="hidden min-w-0 flex-col leading-tight lg:flex">
          <span className="max-w-44 truncate text-sm font-semibold">{user.name || user.email}</span>
          <span className="max-w-44 truncate text-xs text-ink-300">{company.name}</span>
        </span>
        <span className="sr-only">Account: {user.name || user.email}, {company.name}</span>
        <ChevronDownIcon className={cn("hidden size-4 text-ink-300 transition-transform md:block", isOpen && "rotate-180")} />
      </button>

      <div
        id={panelId}
        hidden={!isOpen}
        className="absolute right-0 z-30 mt-2 w-[min(20rem,calc(100vw-1.5rem))] rounded-lg border border-ink-200 bg-white p-2 text-ink-900 shadow-raised"
      >
        <div className="space-y-1 border-b border-ink-100 px-3 pt-2 pb-3">
          <p className="truncate text-base font-semibold">{user.name || user.email}</p>
          <p className="truncate text-sm text-ink-600">{user.email}</p>
          <div className="flex flex-wrap items-center gap-2 pt-1">
            <Badge tone="brand">{ROLE_LABELS[user.role]}</Badge>
            <span className="truncate text-sm text-ink-700">{company.name}</span>
          </div>
        </div>
        <div className="pt-2">
          <Link to={paths.app.settings.profile.getHref()} className={itemStyles} onClick={() => setIsOpen(false)}>
            <UserIcon className="text-ink-600" />
            My profile
          </Link>
          <button type="button" className={itemStyles} onClick={onSignOut} disabled={signOut.isPending}>
            {signOut.isPending ? <Spinner /> : <SignOutIcon className="text-ink-600" />}
            Sign out
          </button>
          <button
            type="button"
            className={itemStyles}
            onClick={() => {
              setIsOpen(false);
              setIsConfirmingEverywhere(true);
            }}
          >
            <LockIcon className="text-ink-600" />
            Sign out everywhere
          </button>
        </div>
      </div>

      <ConfirmDialog
        open={isConfirmingLoss}
        onOpenChange={setIsConfirmingLoss}
        title="Sign out and delete unsent work?"
        description={`${waiting ?? "Nothing"} on this device, not sent yet. Signing out deletes it from this device. Wait for a signal to send it first, unless you mean to throw it away.`}
        confirmLabel="Sign out and delete it"
        confirmVariant="danger"
        isPending={signOut.isPending}
        onConfirm={signOutNow}
      />
      <ConfirmDialog
        open={isConfirmingEverywhere}
        onOpenChange={setIsConfirmingEverywhere}
        title="Sign out on every device?"
        description="This ends your sessions on every phone, tablet and computer, including this one."
        confirmLabel="Sign out everywhere"
        confirmVariant="danger"
        isPending={signOutEverywhere.isPending}
        onConfirm={() =>
          signOutEverywhere.mutate(undefined, {
            onError: (error) => toast.error("Couldn't sign out everywhere", { description: error.message }),
          })
        }
      />
    </div>
  );
}
