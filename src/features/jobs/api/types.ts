import type { AirflowPicture } from "@shared/airflow/types";
import type { CompletionReport, JobMoney, JobPhoto, JobSheetItem, JobStatus, JobSummary } from "@shared/jobs/index";

export type { JobPhoto, JobSheetItem, JobSummary, JobMoney, CompletionReport };

export interface JobList {
  jobs: JobSummary[];
  /** Sold projects without a crew yet (only for people who assign work). */
  awaitingCrew: { projectId: string; title: string; siteAddress: string }[];
}

interface SheetSpace {
  spaceId: string;
  name: string;
  picture: AirflowPicture | null;
  description: string[];
}

/** GET /api/jobs/:id — the crew's sheet. */
export interface JobSheet {
  job: { id: string; status: JobStatus; scheduledFor: string; completedAt: string | null; crewName: string | null; version: number };
  site: { title: string; address: string; mapUrl: string };
  homeowner: { name: string; phone: string | null; email: string | null };
  scope: {
    optionName: string;
    revision: number;
    acceptedAt: string | null;
    lines: string[];
    changeOrders: { number: number; reason: string; signedAt: string | null; lines: { id: string; action: "add" | "remove"; description: string; quantity: number; unit: string; unitPriceCents?: number }[] }[];
  };
  materials: { catalogItemId: string; name: string; sku: string; quantity: number; unit: string; buyCount: number; buyUnit: string }[];
  before: SheetSpace[];
  after: (SheetSpace & { summary: string | null })[];
  photos: JobPhoto[];
  cautions: string[];
  deferral: string;
  checklist: JobSheetItem[];
  money: JobMoney | null;
  report: { pdfUrl: string } | null;
}

export interface ProjectJob {
  job: { id: string; status: JobStatus; scheduledFor: string; crewUserId: string; crewName: string | null; completedAt: string | null } | null;
}

/** GET /api/public/completion/:token — the homeowner's page. */
export interface PublicCompletion {
  report: CompletionReport;
  photos: { id: string; caption: string | null; url: string }[];
  isPdfReady: boolean;
}
