import type { ComponentProps } from "react";
import { Link } from "react-router";
import { cn } from "@/lib/cn";

export const textLinkStyles =
  "font-medium text-ember-700 underline decoration-ember-300 decoration-2 underline-offset-4 hover:text-ember-800 hover:decoration-ember-600";

/** An in-app text link (react-router `Link`) in the brand style, underlined so it reads as a link. */
export function TextLink({ className, ...props }: ComponentProps<typeof Link>) {
  return <Link className={cn(textLinkStyles, className)} {...props} />;
}
