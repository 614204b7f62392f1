export * from "./types";
export { installChecklist } from "./install-checklist";
export { jobCautions, JOB_DEFERRAL } from "./job-cautions";
export { checklistProblems, type Tick } from "./checklist-state";
export { completionReport, WARRANTY_FALLBACK, type CompletionReport, type ReportFigures } from "./completion-report";
