/**
 * The crew's side of accepted work (DESIGN.md §3, issue 21): the job, its checklist generated from
 * the signed scope, and what the homeowner is told when it is done. Plain serialisable data.
 */
export const JOB_STATUSES = ["assigned", "completed"] as const;
export type JobStatus = (typeof JOB_STATUSES)[number];

/** One thing to install or check, generated from the signed scope (never typed in by hand). */
export interface ChecklistItem {
  /** Stable across reads: `w<n>` for the signed plan's work lines, `m-<catalog id>` for materials, `co<n>-<line id>` for signed change orders. */
  id: string;
  text: string;
  /** The step changes how air enters or leaves the attic: a photo of the finished work is required before it can be ticked. */
  isAirflowChange: boolean;
  /** Its own safety caution, when the step carries one. */
  caution: string | null;
}

export interface JobPhoto {
  id: string;
  caption: string | null;
  url: string;
  thumbUrl: string;
}

/** A checklist item as the sheet shows it: the generated step, whether it is ticked, and its photos. */
export interface JobSheetItem extends ChecklistItem {
  isTicked: boolean;
  tickedAt: string | null;
  photos: JobPhoto[];
}

/** Money on the sheet, present only for the office or when the owner lets the crew see prices. */
export interface JobMoney {
  signedTotalCents: number;
  changeOrdersCents: number;
  jobTotalCents: number;
  paidCents: number;
  balanceCents: number;
}

export interface JobSummary {
  id: string;
  projectId: string;
  status: JobStatus;
  scheduledFor: string;
  completedAt: string | null;
  title: string;
  siteAddress: string;
  crewName: string;
}
