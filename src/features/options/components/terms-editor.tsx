import { formatCents, lineTotalCents } from "@shared/pricing/index";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { Radio, RadioGroup } from "@/components/ui/checkbox";
import { TextField } from "@/components/ui/field";
import { CloseIcon, PlusIcon } from "@/components/ui/icons";
import { discountProblem, laborProblems, newId, type LaborDraft, type OptionDraft } from "../lib/draft";
import { parseCents, parsePositive } from "../lib/numbers";

export interface TermsEditorProps {
  draft: OptionDraft;
  isReadOnly: boolean;
  /** Starting rate for a new labour line, as dollars text. */
  defaultRate: string;
  /** The catalog's labour for the quantities as they stand (null when the items carry no minutes). */
  catalogHours: number | null;
  onChange: (patch: Partial<OptionDraft>) => void;
}

function lineTotal(l: LaborDraft): string | null {
  const h = parsePositive(l.hours, "Hours");
  const r = parseCents(l.rate, "Rate");
  return h.ok && r.ok ? formatCents(lineTotalCents(r.value, h.value)) : null;
}

/** Labour lines and the discount. Money is typed in dollars and kept as exact cents. */
export function TermsEditor({ draft, isReadOnly, defaultRate, catalogHours, onChange }: TermsEditorProps) {
  const setLine = (id: string, patch: Partial<LaborDraft>) => onChange({ labor: draft.labor.map((l) => (l.id === id ? { ...l, ...patch } : l)) });
  const discountError = discountProblem(draft);
  return (
    <>
      <Card>
        <CardHeader>
          <CardTitle>Labour</CardTitle>
          <CardDescription>Work priced by the hour beyond the catalog items, e.g. closing a ridge slot.</CardDescription>
        </CardHeader>
        <CardBody className="space-y-4">
          {draft.labor.length === 0 ? <p className="text-base text-ink-700">No labour lines.</p> : null}
          {draft.labor.map((shown, i) => {
            // A catalog line shows the hours the quantities give now; typing over them marks it overridden.
            const l = shown.hoursBasis === "catalog" && catalogHours !== null ? { ...shown, hours: String(catalogHours) } : shown;
            const p = laborProblems(l);
            const total = lineTotal(l);
            return (
              <fieldset key={l.id} className="space-y-3 rounded-lg border border-ink-200 bg-ink-25 p-3" disabled={isReadOnly}>
                <legend className="sr-only">Labour line {i + 1}</legend>
                <div className="flex items-start gap-2">
                  <TextField
                    label="Work"
                    className="min-w-0 flex-1"
                    value={l.description}
                    error={p.description}
                    onChange={(e) => setLine(l.id, { description: e.target.value })}
                  />
                  {!isReadOnly ? (
                    <Button variant="ghost" size="icon" className="mt-7" aria-label={`Remove labour line ${l.description || i + 1}`} onClick={() => onChange({ labor: draft.labor.filter((x) => x.id !== l.id) })}>
                      <CloseIcon />
                    </Button>
                  ) : null}
                </div>
                <div className="grid grid-cols-2 gap-3 sm:grid-cols-3">
                  <TextField
                    label="Hours"
                    inputMode="decimal"
                    autoComplete="off"
                    value={l.hours}
                    error={p.hours}
                    trailing={<span className="pr-3 text-sm text-ink-600">h</span>}
                    onChange={(e) => setLine(l.id, { hours: e.target.value, ...(l.hoursBasis === "catalog" ? { hoursBasis: "overridden" as const } : {}) })}
                  />
                  <TextField label="Rate per hour" inputMode="decimal" autoComplete="off" value={l.rate} error={p.rate} trailing={<span className="pr-3 text-sm text-ink-600">$</span>} onChange={(e) => setLine(l.id, { rate: e.target.value })} />
                  <p className="col-span-2 self-end pb-2.5 text-base text-ink-800 sm:col-span-1">
                    Line: <span className="font-semibold tabular-nums">{total ?? "—"}</span>
                  </p>
                </div>
                {l.hoursBasis === "catalog" ? (
                  <p className="text-sm text-ink-700" data-labor-basis="catalog">From the catalog's minutes per unit: follows the quantities above.</p>
                ) : null}
                {l.hoursBasis === "overridden" ? (
                  <div className="flex flex-wrap items-center gap-3" data-labor-basis="overridden">
                    <p className="text-sm font-medium text-warning-800">
                      Overridden by hand{catalogHours !== null ? `; the catalog gives ${catalogHours} h for these quantities` : ""}.
                    </p>
                    {!isReadOnly && catalogHours !== null ? (
                      <Button variant="secondary" size="sm" onClick={() => setLine(l.id, { hours: String(catalogHours), hoursBasis: "catalog" })}>
                        Follow the catalog again
                      </Button>
                    ) : null}
                  </div>
                ) : null}
              </fieldset>
            );
          })}
          {!isReadOnly ? (
            <Button variant="secondary" icon={<PlusIcon />} onClick={() => onChange({ labor: [...draft.labor, { id: newId(), description: "", hours: "1", rate: defaultRate }] })}>
              Add labour line
            </Button>
          ) : null}
        </CardBody>
      </Card>

      <Card>
        <CardHeader>
          <CardTitle>Discount</CardTitle>
        </CardHeader>
        <CardBody className="space-y-4">
          <RadioGroup legend="Discount on the subtotal" isInline>
            {(["none", "amount", "percent"] as const).map((kind) => (
              <Radio
                key={kind}
                name="discount-kind"
                label={{ none: "No discount", amount: "Amount off", percent: "Percent off" }[kind]}
                checked={draft.discountKind === kind}
                disabled={isReadOnly}
                onChange={() => onChange({ discountKind: kind })}
              />
            ))}
          </RadioGroup>
          {draft.discountKind === "amount" ? (
            <TextField label="Amount off" inputMode="decimal" autoComplete="off" className="max-w-xs" value={draft.discountAmount} readOnly={isReadOnly} error={discountError ?? undefined} trailing={<span className="pr-3 text-sm text-ink-600">$</span>} onChange={(e) => onChange({ discountAmount: e.target.value })} />
          ) : null}
          {draft.discountKind === "percent" ? (
            <TextField label="Percent off" hint="Rounded half up to the cent" inputMode="decimal" autoComplete="off" className="max-w-xs" value={draft.discountPercent} readOnly={isReadOnly} error={discountError ?? undefined} trailing={<span className="pr-3 text-sm text-ink-600">%</span>} onChange={(e) => onChange({ discountPercent: e.target.value })} />
          ) : null}
        </CardBody>
      </Card>
    </>
  );
}
