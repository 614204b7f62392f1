import type { SnapshotOption, SnapshotSpace } from "@shared/proposals/types";
import { optionFixes } from "@shared/proposals/option-fixes";
import { formatCents } from "@shared/pricing/index";
import { Button } from "@/components/ui/button";
import { InfoIcon, OkIcon } from "@/components/ui/icons";
import { cn } from "@/lib/cn";

export interface OptionChoicesProps {
  options: SnapshotOption[];
  before: SnapshotSpace[];
  /** The option chosen in the form below, or the one accepted. */
  chosenId: string | null;
  acceptedId: string | null;
  /** Offered while the proposal is open. */
  onChoose?: (optionId: string) => void;
}

/**
 * The decision at a glance, side by side even on a phone: each option's price, deposit, what it
 * fixes and what it leaves, and one button to choose it. The full detail of each option (scope,
 * pictures, how the price adds up) is further down the page.
 */
export function OptionChoices({ options, before, chosenId, acceptedId, onChoose }: OptionChoicesProps) {
  return (
    <ul className={cn("grid gap-3", options.length > 1 ? "grid-cols-[repeat(auto-fit,minmax(10rem,1fr))]" : "grid-cols-1")} aria-label="Your options side by side">
      {options.map((option, index) => {
        const fixes = optionFixes(before, option);
        const isAccepted = acceptedId === option.id;
        const isChosen = chosenId === option.id;
        return (
          <li
            key={option.id}
            data-option-choice={index + 1}
            className={cn("flex flex-col gap-3 rounded-lg border bg-white p-3 shadow-card sm:p-4", isAccepted || isChosen ? "border-ok-600 ring-2 ring-ok-600" : "border-ink-200")}
          >
            <div>
              <p className="text-sm font-semibold tracking-wide text-ink-600 uppercase">Option {index + 1}</p>
              <h3 className="text-lg leading-snug font-semibold text-ink-900">{option.name}</h3>
            </div>
            {option.price ? (
              <p className="text-ink-900">
                <span className="block text-2xl font-semibold tabular-nums">{formatCents(option.price.totalCents)}</span>
                <span className="block text-sm text-ink-700">
                  {option.price.depositCents > 0 ? `${formatCents(option.price.depositCents)} deposit when you sign` : "No deposit"}
                </span>
              </p>
            ) : (
              <p className="text-base text-ink-700">Price to be confirmed.</p>
            )}
            <div className="space-y-1.5 text-sm text-ink-800">
              {fixes.meetsCode ? (
                <p className="flex items-start gap-1.5 font-semibold text-ok-900">
                  <OkIcon className="mt-0.5 size-4 shrink-0 text-ok-600" aria-hidden /> Meets the building code minimum
                </p>
              ) : null}
              {fixes.fixed.length > 0 ? (
                <>
                  <p className="font-semibold text-ink-900">Fixes</p>
                  <ul className="space-y-1.5">
                    {fixes.fixed.map((f) => (
                      <li key={f} className="flex items-start gap-1.5">
                        <OkIcon className="mt-0.5 size-4 shrink-0 text-ok-600" aria-hidden />
                        <span>{f}</span>
                      </li>
                    ))}
                  </ul>
                </>
              ) : null}
              {fixes.left.length > 0 ? (
                <>
                  <p className="font-semibold text-ink-900">Leaves as it is</p>
                  <ul className="space-y-1.5">
                    {fixes.left.map((f) => (
                      <li key={f} className="flex items-start gap-1.5">
                        <InfoIcon className="mt-0.5 size-4 shrink-0 text-ink-600" aria-hidden />
                        <span>{f}</span>
                      </li>
                    ))}
                  </ul>
                </>
              ) : null}
            </div>
            <div className="mt-auto pt-1">
              {isAccepted ? (
                <p className="flex items-center gap-1.5 text-base font-semibold text-ok-900">
                  <OkIcon className="size-5 text-ok-600" aria-hidden /> You accepted this option
                </p>
              ) : onChoose ? (
                <Button
                  className="w-full"
                  variant={isChosen ? "primary" : "secondary"}
                  aria-pressed={isChosen}
                  data-choose-option={index + 1}
                  onClick={() => onChoose(option.id)}
                >
                  {isChosen ? `Option ${index + 1} chosen` : `Choose option ${index + 1}`}
                </Button>
              ) : null}
            </div>
          </li>
        );
      })}
    </ul>
  );
}
