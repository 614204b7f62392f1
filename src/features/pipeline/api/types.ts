/** GET /api/pipeline: the contract lives in shared/schemas/pipeline.ts. */
export { PIPELINE_PERIODS_DAYS } from "@shared/schemas/pipeline";
export type { PipelineOverview, PipelinePeriodDays, PipelineProposal } from "@shared/schemas/pipeline";
