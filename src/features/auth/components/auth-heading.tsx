import type { ReactNode } from "react";

/** Title and one line of help at the top of each sign-in, reset and invite page. */
export function AuthHeading({ title, description }: { title: ReactNode; description?: ReactNode }) {
  return (
    <div className="mb-6 space-y-2">
      {typeof title === "string" ? <title>{`${title} · Eavesight`}</title> : null}
      <h1 className="text-2xl font-semibold tracking-tight text-ink-900">{title}</h1>
      {description ? <p className="text-base text-ink-700">{description}</p> : null}
    </div>
  );
}
