/** The jobs feature's public face: the crew's list and sheet, and the homeowner's completion page. */
export { JobsPage } from "./pages/jobs-page";
export { JobSheetPage } from "./pages/job-sheet-page";
export { CompletionPage } from "./pages/completion-page";
