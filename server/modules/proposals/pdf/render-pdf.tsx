import { renderToBuffer } from "@react-pdf/renderer";
import type { ProposalSnapshot } from "../../../../shared/proposals/types.ts";
import { registerFonts } from "./fonts.ts";
import { ProposalDocument, type SignedPart } from "./proposal-document.tsx";

export type { SignedPart } from "./proposal-document.tsx";

export interface RenderInput {
  snapshot: ProposalSnapshot;
  logoDataUrl: string | null;
  photoDataUrls: Record<string, string>;
  signed?: SignedPart;
  /** The public check's address (from APP_ORIGIN), printed in every footer and on the certificate. */
  verifyUrl: string;
}

/** The proposal as PDF bytes. CPU work of a second or so: only ever called from a job worker. */
export async function renderProposalPdf(input: RenderInput): Promise<Buffer> {
  registerFonts();
  const bytes = await renderToBuffer(<ProposalDocument {...input} />);
  // react-pdf frees a finished document's tree in a scheduler task that runs on setImmediate;
  // yielding once lets it run, so renders in a row never pile up (bench/pdf-bench.ts measured it).
  await new Promise((resolve) => setImmediate(resolve));
  return bytes;
}
