import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { execFileSync } from "node:child_process";
import { mkdirSync, mkdtempSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { tmpdir } from "node:os";
import path from "node:path";
import { openSync, type Font } from "fontkit";
import { and, eq, isNotNull } from "drizzle-orm";
import { companies, projects, proposals } from "../../server/db/schema/index.ts";
import { renderProposalPdf } from "../../server/modules/proposals/pdf/render-pdf.tsx";
import { optionFixes } from "../../shared/proposals/option-fixes.ts";
import type { ProposalSnapshot } from "../../shared/proposals/types.ts";
import { verifyPageUrl } from "../../shared/proposals/public-paths.ts";
import { startTestApp, type TestApp } from "../setup/test-app.ts";

/**
 * Issue 16, the proposal PDF as the homeowner reads it: the demo's sent proposals (seeded through
 * the proposals service, scripts/lib/seed-story.ts) rendered by the job's own function, then read
 * back with poppler: the page count, no paragraph printed twice, no two words drawn over each other
 * (`pdftotext -bbox` word boxes), and every character present in the embedded IBM Plex Sans files.
 */

let t: TestApp;
/** A long origin, so the footer wraps as it would for a company's own domain. */
const LONG_VERIFY_URL = verifyPageUrl("https://proposals.tallgrass-exteriors-marrow-creek.example");
const work = mkdtempSync(path.join(tmpdir(), "eavesight-pdf-layout-"));
const shots = path.resolve(".var/screenshots");
let rendered: { title: string; snapshot: ProposalSnapshot; file: string }[] = [];

beforeAll(async () => {
  t = await startTestApp();
  const rows = await t.db.select({ title: projects.title, snapshot: proposals.snapshot }).from(proposals)
    .innerJoin(projects, eq(projects.id, proposals.projectId)).innerJoin(companies, eq(companies.id, proposals.companyId))
    .where(and(eq(companies.slug, "tallgrass"), isNotNull(proposals.snapshot), isNotNull(proposals.sentAt)));
  // The demo's own story; proposals other test files send are not the demo's.
  const demo = rows.filter((r) => r.snapshot?.seller.name === "Priya Lindqvist" && r.snapshot.coverNote);
  mkdirSync(shots, { recursive: true });
  rendered = [];
  for (const [i, r] of demo.entries()) {
    const file = path.join(work, `demo-${i}.pdf`);
    writeFileSync(path.join(work, `demo-${i}.json`), JSON.stringify(r.snapshot));
    writeFileSync(file, await renderProposalPdf({ snapshot: r.snapshot!, logoDataUrl: null, photoDataUrls: {}, verifyUrl: LONG_VERIFY_URL }));
    execFileSync("pdftoppm", ["-png", "-r", "50", file, path.join(shots, `demo-proposal-${i}`)]);
    rendered.push({ title: r.title, snapshot: r.snapshot!, file });
  }
}, 120_000);
afterAll(async () => t?.close());

const pageCount = (file: string) => Number(/Pages:\s+(\d+)/.exec(execFileSync("pdfinfo", [file]).toString())![1]);

interface Word { page: number; text: string; xMin: number; yMin: number; xMax: number; yMax: number }
function words(file: string): Word[] {
  const html = execFileSync("pdftotext", ["-bbox", file, "-"]).toString();
  const out: Word[] = [];
  html.split("<page ").slice(1).forEach((pageHtml, page) => {
    for (const m of pageHtml.matchAll(/<word xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([^<]*)<\/word>/g)) {
      out.push({ page, text: m[5]!, xMin: Number(m[1]), yMin: Number(m[2]), xMax: Number(m[3]), yMax: Number(m[4]) });
    }
  });
  return out;
}

/** Pairs of words on one page whose boxes cross by more than half a point each way. */
function overlaps(ws: Word[]): string[] {
  const found: string[] = [];
  const EPS_PT = 0.5;
  for (let i = 0; i < ws.length; i++) {
    for (let j = i + 1; j < ws.length; j++) {
      const a = ws[i]!, b = ws[j]!;
      if (a.page !== b.page) continue;
      const dx = Math.min(a.xMax, b.xMax) - Math.max(a.xMin, b.xMin);
      const dy = Math.min(a.yMax, b.yMax) - Math.max(a.yMin, b.yMin);
      if (dx > EPS_PT && dy > EPS_PT) found.push(`page ${a.page + 1}: "${a.text}" over "${b.text}"`);
    }
  }
  return found;
}

const norm = (text: string) => text.replace(/\s+/g, " ").replace(/^•\s*/, "").trim();

/**
 * What two options may both print: a scope line they share (both remove the old turbines) and the
 * same "Fixes: …" on the summary. Anything else printed twice is a repeat.
 */
function sharedByOptions(snapshot: ProposalSnapshot): string[] {
  const count = new Map<string, number>();
  for (const o of snapshot.options) {
    const fixes = optionFixes(snapshot.before, o);
    const own = new Set([...o.scope, `Fixes: ${fixes.fixed.join("; ")}.`, `Leaves as it is: ${fixes.left.join("; ")}.`].map(norm));
    for (const text of own) count.set(text, (count.get(text) ?? 0) + 1);
  }
  return [...count].filter(([, n]) => n > 1).map(([text]) => text);
}

/**
 * Paragraphs of running text (pdftotext separates blocks with a blank line; a table label is
 * shorter than 70 characters) printed more than once. An option's name is its heading on the
 * summary and on its own page, and two options may share a scope line.
 */
function repeatedParagraphs(file: string, snapshot: ProposalSnapshot): string[] {
  const text = execFileSync("pdftotext", [file, "-"]).toString();
  const headings = new Set(snapshot.options.map((o, i) => `Option ${i + 1}: ${o.name}`));
  const footerStart = `${snapshot.company.name} · Proposal ${snapshot.proposalId.slice(0, 8)} rev. ${snapshot.revision}`;
  const shared = sharedByOptions(snapshot);
  const seen = new Map<string, number>();
  for (const block of text.split(/\n\s*\n/)) {
    const paragraph = norm(block);
    // The running footer (company, proposal and where to check a copy, then the page number) is on every page by design.
    const isFooter = /Page \d+ of \d+/.test(paragraph) || paragraph.startsWith(footerStart);
    if (paragraph.length < 70 || isFooter || headings.has(paragraph) || shared.some((t) => t.includes(paragraph))) continue;
    seen.set(paragraph, (seen.get(paragraph) ?? 0) + 1);
  }
  return [...seen].filter(([, n]) => n > 1).map(([paragraph, n]) => `${n}× ${paragraph}`);
}

const require = createRequire(import.meta.url);
const fonts: Font[] = ["latin", "latin-ext"].flatMap((subset) => [400, 600, 700].map((w) => openSync(require.resolve(`@fontsource/ibm-plex-sans/files/ibm-plex-sans-${subset}-${w}-normal.woff`))));
/** fonts[0..2] are the latin subset's 400/600/700, fonts[3..5] latin-ext's: a character needs a glyph in one subset for each weight. */
const isCoveredEverywhere = (cp: number) => [0, 1, 2].every((w) => fonts[w]!.hasGlyphForCodePoint(cp) || fonts[3 + w]!.hasGlyphForCodePoint(cp));

/** Every string in the snapshot, deep: what the document can print. */
function strings(value: unknown): string[] {
  if (typeof value === "string") return value.startsWith("data:") ? [] : [value];
  if (Array.isArray(value)) return value.flatMap(strings);
  if (value && typeof value === "object") return Object.values(value).flatMap(strings);
  return [];
}

describe("the demo proposals as PDFs", () => {
  it("when the demo is seeded, then there are sent proposals to read (sent, viewed, accepted, declined)", () => {
    expect(rendered.length).toBeGreaterThanOrEqual(4);
  });

  it("when a proposal has two options for one attic, then it fits in 5 pages", () => {
    const twoOptionsOneAttic = rendered.filter((r) => r.snapshot.options.length === 2 && r.snapshot.before.length === 1);
    expect(twoOptionsOneAttic.length).toBeGreaterThan(0);
    for (const r of twoOptionsOneAttic) expect(pageCount(r.file), r.title).toBeLessThanOrEqual(5);
  });

  it("when read back as text, then no paragraph is printed twice (cautions, captions, findings and scope lines appear once)", () => {
    for (const r of rendered) expect(repeatedParagraphs(r.file, r.snapshot), r.title).toEqual([]);
  });

  it("when the word boxes are read, then no text is drawn over other text", () => {
    for (const r of rendered) expect(overlaps(words(r.file)), r.title).toEqual([]);
  });

  it("when every character the document prints is looked up in the embedded fonts, then each has a glyph in every weight", () => {
    for (const r of rendered) {
      const printed = execFileSync("pdftotext", [r.file, "-"]).toString() + strings(r.snapshot).join("");
      const missing = [...new Set([...printed])].filter((ch) => ch.trim() !== "" && !isCoveredEverywhere(ch.codePointAt(0)!));
      expect(missing, r.title).toEqual([]);
    }
  });

  it("when the text is read, then no internal wording or technician's instruction reaches the homeowner", () => {
    for (const r of rendered) {
      const text = execFileSync("pdftotext", [r.file, "-"]).toString().replace(/\s+/g, " ");
      expect(text, r.title).not.toMatch(/catalog's minutes|\(OL\b|winding reads|bring water|work early in the day/);
    }
  });
});
