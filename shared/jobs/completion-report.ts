import type { ProposalSnapshot, SnapshotAnalysis, SnapshotOption } from "../proposals/types";
import { HOMEOWNER_BACKDRAFT_CAUTION } from "../proposals/disclosures";
import type { ChangeOrderLine } from "../change-orders/types";
import { formatNumber } from "../units/format";
import type { JobMoney, JobSheetItem } from "./types";

/** The figures a homeowner can compare, from the core's analysis frozen in the signed proposal. */
export interface ReportFigures {
  requiredSqIn: number;
  intakeSqIn: number;
  exhaustSqIn: number;
  isCompliant: boolean;
  summary: string;
}

/** What the homeowner is told when the job is done: one page, the same data for the PDF and the page. */
export interface CompletionReport {
  company: { name: string; phone: string | null; email: string | null; addressLine: string | null; licenseNumber: string | null };
  customer: { name: string };
  site: { address: string; title: string };
  completedAt: string;
  completedOn: string;
  crewName: string;
  optionName: string;
  installed: string[];
  spaces: { name: string; before: ReportFigures | null; after: ReportFigures | null }[];
  checkedCount: number;
  photographedCount: number;
  money: Pick<JobMoney, "jobTotalCents" | "paidCents" | "balanceCents">;
  balanceCents: number;
  warranty: string;
  cautions: string[];
}

/** Said when the company profile has no warranty text yet: the homeowner is told where to ask, never promised terms. */
export const WARRANTY_FALLBACK = "Your warranty is as written in the proposal you signed; ask us for a copy at any time.";

const figures = (a: SnapshotAnalysis | null | undefined): ReportFigures | null =>
  a ? { requiredSqIn: a.requirement.totalSqIn, intakeSqIn: a.provided.intakeSqIn, exhaustSqIn: a.provided.exhaustSqIn, isCompliant: a.compliant, summary: a.summary } : null;

const dateWords = (d: Date) => new Intl.DateTimeFormat("en-US", { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" }).format(d);

/**
 * The completion report: what was installed (the signed scope and each signed change order),
 * the core's before and after figures for each space as the signed proposal froze them, how many
 * steps were checked and photographed, the money still due and the warranty from the company profile.
 *
 * @example
 * completionReport({ …, option: { scope: ["Install 40 ft of ridge vent."] }, changes: [] }).installed
 * // ["Install 40 ft of ridge vent."]
 */
export function completionReport(input: {
  snapshot: ProposalSnapshot;
  option: SnapshotOption;
  items: readonly JobSheetItem[];
  changes: readonly { number: number; lines: readonly ChangeOrderLine[] }[];
  money: JobMoney;
  completedAt: Date;
  crewName: string;
  company: CompletionReport["company"] & { warrantyTerms: string | null };
}): CompletionReport {
  const { snapshot, option } = input;
  const installed = [
    ...option.scope,
    ...input.changes.flatMap((c) => c.lines.map((l) => `Change order ${c.number}: ${l.action === "add" ? "added" : "left out"} ${l.description} (${formatNumber(l.quantity, { maxFractionDigits: 3 })} ${l.unit}).`)),
  ];
  const { warrantyTerms, ...company } = input.company;
  return {
    company,
    customer: { name: snapshot.customer.name },
    site: { address: snapshot.site.address, title: snapshot.site.projectTitle },
    completedAt: input.completedAt.toISOString(),
    completedOn: dateWords(input.completedAt),
    crewName: input.crewName,
    optionName: option.name,
    installed,
    spaces: option.after.map((after) => ({ name: after.name, before: figures(snapshot.before.find((b) => b.spaceId === after.spaceId)?.analysis), after: figures(after.analysis) })),
    checkedCount: input.items.filter((i) => i.isTicked).length,
    photographedCount: input.items.filter((i) => i.photos.length > 0).length,
    money: { jobTotalCents: input.money.jobTotalCents, paidCents: input.money.paidCents, balanceCents: input.money.balanceCents },
    balanceCents: input.money.balanceCents,
    warranty: warrantyTerms?.trim() || WARRANTY_FALLBACK,
    cautions: option.hasPoweredFan ? [HOMEOWNER_BACKDRAFT_CAUTION] : [],
  };
}
