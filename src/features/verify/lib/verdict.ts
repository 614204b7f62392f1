import type { VerifyAnswer } from "../api/types";

export type VerdictTone = "ok" | "info" | "warning" | "critical";

export interface Verdict {
  /** The answer in one line, first thing read. */
  title: string;
  /** Which document it is and where it stands, in plain sentences. */
  details: string[];
  tone: VerdictTone;
}

type When = (iso: string) => string;

/**
 * What a check's answer means to the person holding the file. A match names only what the file
 * itself shows (company, revision or change order) and where it stands; no match says nothing else.
 *
 * @example
 * verdictOf({ sha256: "ab…", matches: false }, String).title // "No match: this file is not a document on record"
 */
export function verdictOf(answer: VerifyAnswer, when: When): Verdict {
  if (!answer.matches) {
    return {
      tone: "critical",
      title: "No match: this file is not a document on record",
      details: [
        "It is not, byte for byte, a proposal or change order as it was sent or signed. It may have been changed, even slightly (edited, re-saved or printed to a new PDF), or it may come from somewhere else.",
        "If you expected a match, compare it with the copy attached to your e-mail, or ask the company that sent it for a fresh copy.",
      ],
    };
  }
  const d = answer.document;
  const company = d.companyName || "the company";
  const sent = d.sentAt ? `, sent ${when(d.sentAt)}` : "";
  if (d.kind === "change-order") {
    const what = `Change order ${d.changeOrderNumber ?? "?"} to revision ${d.revision} of the proposal from ${company}${sent}.`;
    if (d.status === "signed" && d.signedAt) {
      return { tone: "ok", title: "This change order matches our record, and it was signed", details: [what, `It was signed on ${when(d.signedAt)}, so it is part of the agreed work.`] };
    }
    if (d.status === "declined") {
      return { tone: "warning", title: "This change order matches our record, but it was declined", details: [what, `It was declined${d.decidedAt ? ` on ${when(d.decidedAt)}` : ""}, so it changes nothing.`] };
    }
    return { tone: "info", title: "This change order matches our record; it is not signed yet", details: [what, "It changes the work only once it is signed."] };
  }
  const revision = `Proposal revision ${d.revision} from ${company}${sent}.`;
  if (d.kind === "signed") {
    return {
      tone: "ok",
      title: "This is the signed original",
      details: [revision, d.signedAt ? `It was signed on ${when(d.signedAt)}. The file is exactly as it was made at signing, unchanged.` : "The file is exactly as it was made at signing, unchanged."],
    };
  }
  if (d.isSuperseded) {
    return { tone: "warning", title: "This is an earlier revision that was replaced", details: [revision, "The company sent a newer revision after this one, so this one can no longer be signed."] };
  }
  if (d.status === "accepted") {
    return {
      tone: "info",
      title: "This is the proposal as sent, before it was signed",
      details: [
        revision,
        `It matches our record, but it is not the signed copy${d.signedAt ? `: the proposal was signed on ${when(d.signedAt)}` : ""}. The signed copy ends with a signing certificate page.`,
      ],
    };
  }
  if (d.status === "declined") {
    return { tone: "warning", title: "This proposal matches our record, but it was declined", details: [revision, `It was declined${d.decidedAt ? ` on ${when(d.decidedAt)}` : ""}, so it was never signed.`] };
  }
  if (d.status === "expired") {
    return { tone: "warning", title: "This proposal matches our record, but it expired unsigned", details: [revision, "Its validity date passed before it was signed."] };
  }
  return { tone: "info", title: "This proposal matches our record; it is not signed yet", details: [revision, "It is exactly as it was sent. It becomes an agreement only once it is signed."] };
}
