import { ChevronDownIcon } from "@/components/ui/icons";

/** A section the homeowner opens when they want it: the details behind the decision. */
export function Folded({ summary, children, id }: { summary: React.ReactNode; children: React.ReactNode; id?: string }) {
  return (
    <details id={id} className="group rounded-lg border border-ink-200 bg-white">
      <summary className="flex min-h-touch cursor-pointer list-none items-center justify-between gap-3 px-4 py-3 text-lg font-semibold text-ink-900 [&::-webkit-details-marker]:hidden">
        <span>{summary}</span>
        <ChevronDownIcon className="size-5 shrink-0 text-ink-600 transition-transform group-open:rotate-180" aria-hidden />
      </summary>
      <div className="space-y-4 border-t border-ink-100 px-4 py-4">{children}</div>
    </details>
  );
}
