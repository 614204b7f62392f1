/**
 * The CPU-heavy work of the server, run on the compute pool's worker threads (pool.ts) so the
 * request thread stays free: a project's analysis (every attic space through the core) and the
 * PDFs. Each task takes plain data and gives back a string or bytes, so nothing crosses the thread
 * boundary but what structured clone copies cheaply.
 */
import { analyzeSpace } from "../../modules/projects/analyze-space.ts";
import { renderChangeOrderPdf, type ChangeOrderRenderInput } from "../../modules/proposals/pdf/change-order-document.tsx";
import { renderProposalPdf, type RenderInput } from "../../modules/proposals/pdf/render-pdf.tsx";
import type { ProjectBasis } from "../../../shared/survey/to-attic-input.ts";
import type { SpaceSurvey } from "../../../shared/schemas/survey.ts";

export interface AnalyzeProjectInput {
  project: ProjectBasis;
  spaces: (SpaceSurvey & { id: string })[];
}

/** `{ spaces: SpaceAnalysis[] }` as JSON: serialised here, so the request thread only sends it. */
export function analyzeProject(input: AnalyzeProjectInput): string {
  return JSON.stringify({ spaces: input.spaces.map((space) => analyzeSpace(input.project, space)) });
}

/** The PDF's bytes (they arrive on the request thread as a Uint8Array copy). */
export async function renderProposal(input: RenderInput): Promise<Uint8Array> {
  return renderProposalPdf(input);
}

export async function renderChangeOrder(input: ChangeOrderRenderInput): Promise<Uint8Array> {
  return renderChangeOrderPdf(input);
}
