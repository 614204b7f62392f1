/**
 * One pool of worker threads per server process for CPU-heavy work (compute-tasks.ts): a project's
 * analysis and the PDFs. The request thread hands the work over and goes on answering, so the health
 * check and every other request stay quick while the largest legal project is analysed or the
 * largest proposal is drawn (issue 13, item 6; decision 27).
 *
 * - Threads: `COMPUTE_THREADS` (default: the machine's cores less one, at least 1); `0` runs the
 *   tasks on the calling thread (a last resort for a machine where worker threads can't start).
 * - A bounded queue: when `COMPUTE_QUEUE` tasks already wait, the next is refused at once with a 503
 *   and Retry-After (the caller's request, not the server, waits); a job retries by itself.
 */
import os from "node:os";
import Tinypool from "tinypool";
import { parseEnv } from "../../env.ts";
import { AppError } from "../errors.ts";
import type * as Tasks from "./compute-tasks.ts";

type TaskName = "analyzeProject" | "renderProposal" | "renderChangeOrder";
type TaskInput<N extends TaskName> = Parameters<(typeof Tasks)[N]>[0];
type TaskOutput<N extends TaskName> = Awaited<ReturnType<(typeof Tasks)[N]>>;

export interface ComputePool {
  run<N extends TaskName>(name: N, input: TaskInput<N>): Promise<TaskOutput<N>>;
  close(): Promise<void>;
}

export const busyError = () => new AppError("busy", "The server is busy with large calculations. Please try again in a few seconds.", 503);

export function createComputePool(opts: { threads?: number; maxQueue?: number } = {}): ComputePool {
  const threads = opts.threads ?? Math.max(1, os.availableParallelism() - 1);
  const maxQueue = opts.maxQueue ?? 64;
  if (threads === 0) {
    let loaded: Promise<typeof Tasks> | undefined;
    return {
      async run(name, input) {
        loaded ??= import("./compute-tasks.ts");
        const tasks = await loaded;
        return (tasks[name] as (i: typeof input) => unknown)(input) as never;
      },
      async close() {},
    };
  }
  const pool = new Tinypool({
    filename: new URL("./worker-entry.mjs", import.meta.url).href,
    minThreads: 0,
    maxThreads: threads,
    // A thread that has loaded the core and the PDF fonts is kept a while for the next task.
    idleTimeout: 60_000,
    maxQueue,
  });
  return {
    async run(name, input) {
      if (pool.queueSize >= maxQueue) throw busyError();
      return (await pool.run(input, { name })) as never;
    },
    async close() {
      await pool.destroy();
    },
  };
}

let shared: ComputePool | undefined;
/** The process's pool, made on first use with the configured sizes (server/env.ts). */
export function computePool(): ComputePool {
  if (!shared) {
    const env = parseEnv();
    shared = createComputePool({ threads: env.COMPUTE_THREADS, maxQueue: env.COMPUTE_QUEUE });
  }
  return shared;
}
/** Ends the process's pool (at shutdown). */
export async function closeComputePool(): Promise<void> {
  const pool = shared;
  shared = undefined;
  await pool?.close();
}
