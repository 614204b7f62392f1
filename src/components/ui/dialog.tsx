import * as RadixDialog from "@radix-ui/react-dialog";
import { useLayoutEffect, useRef, useState, type RefObject, type ReactNode } from "react";
import { cn } from "@/lib/cn";
import { Button, type ButtonVariant } from "./button";
import { CloseIcon } from "./icons";

/** Root of a dialog: `<Dialog open onOpenChange>` (controlled) or with a `DialogTrigger`. */
export const Dialog = RadixDialog.Root;
export const DialogTrigger = RadixDialog.Trigger;
export const DialogClose = RadixDialog.Close;

export interface DialogContentProps {
  title: ReactNode;
  /** Read out when the dialog opens. */
  description?: ReactNode;
  children?: ReactNode;
  className?: string;
  /** Footer buttons; laid out right-aligned on desktop, stacked full-width on phones. */
  footer?: ReactNode;
}

/**
 * Notes the element that had focus as the dialog opens. It renders with the dialog's content, before
 * anything inside takes focus (an autoFocus field included), so what it reads is the opener.
 */
function RememberOpener({ openerRef }: { openerRef: RefObject<Opener | null> }) {
  const [opener] = useState(openerNow);
  useLayoutEffect(() => {
    openerRef.current = opener;
  }, [opener, openerRef]);
  return null;
}

const FOCUSABLE = 'button:not([disabled]), a[href], input:not([disabled]), select:not([disabled]), textarea:not([disabled]), [tabindex]:not([tabindex="-1"])';

/**
 * When the dialog removed what opened it (a "Remove" that deleted its card), keyboard users should
 * carry on near where they were, not from the top of the page: the first control in the nearest
 * part of the page still there, else the main content.
 */
function nearestFocusableAfterRemoval(opener: Opener): HTMLElement | null {
  for (const node of opener.ancestors) {
    if (!node.isConnected) continue;
    const control = node.querySelector<HTMLElement>(FOCUSABLE);
    if (control) return control;
  }
  return document.getElementById("main");
}

/** The element that opened a dialog, and its ancestors as they were (a removed node forgets its parent). */
interface Opener {
  element: HTMLElement;
  ancestors: HTMLElement[];
}
function openerNow(): Opener | null {
  const element = document.activeElement as HTMLElement | null;
  if (!element) return null;
  const ancestors: HTMLElement[] = [];
  for (let node = element.parentElement; node && node !== document.body; node = node.parentElement) ancestors.push(node);
  return { element, ancestors };
}

/**
 * A modal dialog: focus is trapped, Escape closes it, focus returns to the element that opened it.
 * On phones it rises from the bottom edge, where a thumb can reach the buttons.
 */
export function DialogContent({ title, description, children, className, footer }: DialogContentProps) {
  // Radix hands focus back only to a DialogTrigger; our dialogs are opened by state, so the opener is kept here.
  const openerRef = useRef<Opener | null>(null);
  return (
    <RadixDialog.Portal>
      <RadixDialog.Overlay className="fixed inset-0 z-40 bg-ink-950/55 data-[state=open]:animate-[fade-in_150ms_ease-out]" />
      <RadixDialog.Content
        className={cn(
          "fixed z-50 flex max-h-[92dvh] w-full flex-col overflow-hidden bg-white shadow-raised",
          "inset-x-0 bottom-0 rounded-t-xl pb-[env(safe-area-inset-bottom)]",
          "sm:inset-auto sm:top-1/2 sm:left-1/2 sm:w-[min(34rem,calc(100vw-2rem))] sm:-translate-x-1/2 sm:-translate-y-1/2 sm:rounded-xl sm:pb-0",
          "data-[state=open]:animate-[rise-in_180ms_ease-out]",
          className,
        )}
        {...(description ? {} : { "aria-describedby": undefined })}
        onCloseAutoFocus={(event) => {
          const opener = openerRef.current;
          if (!opener || opener.element === document.body) return;
          const target = opener.element.isConnected ? opener.element : nearestFocusableAfterRemoval(opener);
          if (!target) return;
          event.preventDefault();
          target.focus();
        }}
      >
        <RememberOpener openerRef={openerRef} />
        <div className="flex items-start justify-between gap-4 px-5 pt-5 sm:px-6 sm:pt-6">
          <div className="space-y-1.5">
            <RadixDialog.Title className="text-xl font-semibold text-ink-900">{title}</RadixDialog.Title>
            {description ? (
              <RadixDialog.Description className="text-base text-ink-700">{description}</RadixDialog.Description>
            ) : null}
          </div>
          <RadixDialog.Close asChild>
            <Button variant="ghost" size="icon" aria-label="Close" className="-mt-2 -mr-2">
              <CloseIcon />
            </Button>
          </RadixDialog.Close>
        </div>
        {children ? <div className="overflow-y-auto px-5 py-4 sm:px-6">{children}</div> : <div className="h-4" />}
        {footer ? (
          <div className="flex flex-col-reverse gap-3 border-t border-ink-100 px-5 py-4 sm:flex-row sm:justify-end sm:px-6">
            {footer}
          </div>
        ) : null}
      </RadixDialog.Content>
    </RadixDialog.Portal>
  );
}

export interface ConfirmDialogProps {
  open: boolean;
  onOpenChange: (open: boolean) => void;
  title: ReactNode;
  description?: ReactNode;
  children?: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  /** "danger" for actions that remove or end something. */
  confirmVariant?: ButtonVariant;
  isPending?: boolean;
  onConfirm: () => void;
}

/** "Are you sure?" with a clear verb on the confirm button. The caller closes it when the work is done. */
export function ConfirmDialog({
  open,
  onOpenChange,
  title,
  description,
  children,
  confirmLabel,
  cancelLabel = "Cancel",
  confirmVariant = "primary",
  isPending = false,
  onConfirm,
}: ConfirmDialogProps) {
  return (
    <Dialog open={open} onOpenChange={(next) => (isPending ? undefined : onOpenChange(next))}>
      <DialogContent
        title={title}
        description={description}
        footer={
          <>
            <DialogClose asChild>
              <Button variant="secondary" disabled={isPending} className="w-full sm:w-auto">
                {cancelLabel}
              </Button>
            </DialogClose>
            <Button variant={confirmVariant} isLoading={isPending} onClick={onConfirm} className="w-full sm:w-auto">
              {confirmLabel}
            </Button>
          </>
        }
      >
        {children}
      </DialogContent>
    </Dialog>
  );
}
