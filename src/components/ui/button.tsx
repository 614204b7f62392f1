import type { ComponentProps, ReactNode } from "react";
import { cn } from "@/lib/cn";
import { Spinner } from "./spinner";

export type ButtonVariant = "primary" | "secondary" | "ghost" | "danger" | "inverse";
export type ButtonSize = "sm" | "md" | "lg" | "icon";

const base =
  "inline-flex items-center justify-center gap-2 rounded-md font-semibold whitespace-nowrap select-none " +
  "transition-colors duration-150 disabled:cursor-not-allowed disabled:opacity-55 aria-busy:cursor-progress";

const variants: Record<ButtonVariant, string> = {
  primary: "bg-ember-600 text-white shadow-card hover:bg-ember-700 active:bg-ember-800 disabled:hover:bg-ember-600",
  secondary:
    "border border-ink-400 bg-white text-ink-900 hover:border-ink-500 hover:bg-ink-50 active:bg-ink-100 disabled:hover:bg-white",
  ghost: "text-ink-800 hover:bg-ink-100 active:bg-ink-200 disabled:hover:bg-transparent",
  danger: "bg-critical-600 text-white shadow-card hover:bg-critical-700 active:bg-critical-800",
  inverse: "bg-ink-800 text-white hover:bg-ink-700 active:bg-ink-600",
};

// Every size reaches 44 px on touch screens; `sm` is slimmer only under a mouse.
const sizes: Record<ButtonSize, string> = {
  sm: "h-9 px-3 text-sm pointer-coarse:h-touch",
  md: "h-touch px-4 text-base",
  lg: "h-touch-lg px-6 text-lg",
  icon: "size-touch p-0",
};

/** Button classes for things that look like a button but are links (`<Link className={buttonStyles()}>`). */
export function buttonStyles({
  variant = "primary",
  size = "md",
  className,
}: { variant?: ButtonVariant; size?: ButtonSize; className?: string } = {}): string {
  return cn(base, variants[variant], sizes[size], className);
}

export interface ButtonProps extends ComponentProps<"button"> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Shows a spinner, disables the button and sets aria-busy; the label stays so the width holds. */
  isLoading?: boolean;
  /** Replaces the label while loading, e.g. "Signing in…". */
  loadingText?: string;
  /** Icon before the label (hidden from screen readers by the icon itself). */
  icon?: ReactNode;
}

export function Button({
  variant = "primary",
  size = "md",
  isLoading = false,
  loadingText,
  icon,
  className,
  children,
  disabled,
  type = "button",
  ...props
}: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || isLoading}
      aria-busy={isLoading || undefined}
      className={buttonStyles({ variant, size, className })}
      {...props}
    >
      {isLoading ? <Spinner className="size-[1.1em]" /> : icon}
      {isLoading && loadingText ? loadingText : children}
    </button>
  );
}
