/**
 * The PDFs as the server makes them: drawn on a compute-pool thread (server/lib/compute), so a long
 * drawing (the largest legal proposal takes many seconds) never holds up the request thread.
 */
import { computePool } from "../../../lib/compute/pool.ts";
import type { ChangeOrderRenderInput } from "./change-order-document.tsx";
import type { RenderInput } from "./render-pdf.tsx";

const asBuffer = (bytes: Uint8Array) => Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);

export async function renderProposalPdfOffThread(input: RenderInput): Promise<Buffer> {
  return asBuffer(await computePool().run("renderProposal", input));
}

export async function renderChangeOrderPdfOffThread(input: ChangeOrderRenderInput): Promise<Buffer> {
  return asBuffer(await computePool().run("renderChangeOrder", input));
}
