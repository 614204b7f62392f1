// The compute pool's worker threads start here. Node 20 does not pass the main thread's
// `--import tsx` on to worker threads, so each one registers tsx itself before it loads the
// TypeScript tasks (the server itself runs from its TypeScript sources: DEVELOPERS.md).
import { register } from "tsx/esm/api";

register();
const tasks = await import("./compute-tasks.ts");

export const analyzeProject = tasks.analyzeProject;
export const renderProposal = tasks.renderProposal;
export const renderChangeOrder = tasks.renderChangeOrder;
