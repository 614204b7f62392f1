import { formatBasisPoints, formatCents, type OptionPrice } from "@shared/pricing/index";
import { Alert } from "@/components/ui/alert";
import { cn } from "@/lib/cn";

export interface PriceSummaryProps {
  price: OptionPrice | null;
  issue?: string | null;
  /** The deposit to show (the server's, from the company's rule); null while a save is pending. */
  deposit?: { cents: number; words?: string } | null;
  isDepositPending?: boolean;
  showLines?: boolean;
  className?: string;
}

function Row({ label, value, isStrong, testId }: { label: string; value: string; isStrong?: boolean; testId?: string }) {
  return (
    <div className={cn("flex items-baseline justify-between gap-4 py-1", isStrong && "border-t border-ink-200 pt-2 text-lg font-semibold")}>
      <dt className={isStrong ? "text-ink-900" : "text-ink-700"}>{label}</dt>
      <dd className="tabular-nums text-ink-900" data-testid={testId}>
        {value}
      </dd>
    </div>
  );
}

/** Subtotal, discount, tax, total and deposit from integer cents; the lines with their arithmetic. */
export function PriceSummary({ price, issue, deposit, isDepositPending, showLines = false, className }: PriceSummaryProps) {
  if (!price) {
    return (
      <Alert severity="warning" title="No price yet" className={className}>
        {issue ?? "This option can't be priced yet."}
      </Alert>
    );
  }
  return (
    <div className={cn("space-y-3", className)}>
      {showLines && price.lines.length > 0 ? (
        <ul className="space-y-1.5 border-b border-ink-100 pb-3 text-sm text-ink-800">
          {price.lines.map((line) => (
            <li key={line.id} className="flex items-baseline justify-between gap-3">
              <span>{line.explanation}</span>
            </li>
          ))}
        </ul>
      ) : null}
      <dl className="text-base">
        <Row label="Subtotal" value={formatCents(price.subtotalCents)} testId="price-subtotal" />
        {price.discountCents > 0 ? <Row label="Discount" value={`−${formatCents(price.discountCents)}`} /> : null}
        <Row label={`Tax (${formatBasisPoints(price.taxRateBasisPoints)})`} value={formatCents(price.taxCents)} testId="price-tax" />
        <Row label="Total" value={formatCents(price.totalCents)} isStrong testId="price-total" />
        <Row
          label="Deposit at signing"
          value={isDepositPending || !deposit ? "worked out on save…" : formatCents(deposit.cents)}
          testId="price-deposit"
        />
      </dl>
      {showLines ? (
        <details className="rounded-md border border-ink-200 bg-white px-3 py-1 text-sm">
          <summary className="min-h-touch cursor-pointer py-2.5 font-medium text-ink-900 md:min-h-0 md:py-2">How the total was worked out</summary>
          <ul className="list-disc space-y-1 pt-1 pb-2 pl-5 text-ink-800">
            {price.explanation.map((e) => (
              <li key={e}>{e}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
