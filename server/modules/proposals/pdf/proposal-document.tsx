import { Fragment, type ReactNode } from "react";
import { Document, Image, Page, StyleSheet, Text, View } from "@react-pdf/renderer";
import type { AirflowPicture } from "../../../../shared/airflow/index.ts";
import { homeownerFindings, homeownerNotes } from "../../../../shared/proposals/homeowner-words.ts";
import { optionFixes } from "../../../../shared/proposals/option-fixes.ts";
import type { ProposalAcceptance, ProposalSnapshot, SnapshotAnalysis, SnapshotOption, SnapshotSpace } from "../../../../shared/proposals/types.ts";
import { formatCents, formatBasisPoints } from "../../../../shared/pricing/index.ts";
import { formatNumber } from "../../../../shared/units/format.ts";
import { AirflowEstimatesPdf } from "./airflow-estimate-pdf.tsx";
import { AirflowSvg } from "./airflow-svg.tsx";
import { PLEX_FAMILIES } from "./fonts.ts";
import { breakLongToken } from "./break-long-text.ts";

const INK = "#22262b";
const MUTED = "#5d646d";
const RULE = "#d5d9de";
const ACCENT = "#1f5c4a";
const PAPER_TINT = "#f4f6f5";

/** Letter, 612 pt wide, less 50 pt margins on each side. */
const CONTENT_WIDTH_PT = 512;

const s = StyleSheet.create({
  page: { paddingTop: 48, paddingBottom: 56, paddingHorizontal: 50, fontFamily: PLEX_FAMILIES as unknown as string, fontSize: 10, color: INK },
  body: { lineHeight: "14pt" },
  footer: { position: "absolute", bottom: 24, left: 50, right: 50, flexDirection: "row", justifyContent: "space-between", gap: 12, fontSize: 8, color: MUTED, borderTopWidth: 0.5, borderTopColor: RULE, paddingTop: 6 },
  // Wraps to a second line with a long origin; the page's bottom padding leaves room for two.
  footerLeft: { flex: 1, lineHeight: "11pt" },
  coverBand: { flexDirection: "row", justifyContent: "space-between", alignItems: "flex-start", borderBottomWidth: 2, borderBottomColor: ACCENT, paddingBottom: 14, marginBottom: 18 },
  company: { fontSize: 18, fontWeight: 700, color: ACCENT, lineHeight: "23pt", marginBottom: 2 },
  small: { fontSize: 8.5, color: MUTED, lineHeight: "12pt" },
  logo: { maxWidth: 140, maxHeight: 60, objectFit: "contain" },
  title: { fontSize: 22, fontWeight: 700, lineHeight: "27pt", marginBottom: 4 },
  h2: { fontSize: 14, fontWeight: 700, color: ACCENT, lineHeight: "18pt", marginTop: 14, marginBottom: 6 },
  h3: { fontSize: 11, fontWeight: 600, lineHeight: "15pt", marginTop: 8, marginBottom: 3 },
  para: { marginBottom: 5, lineHeight: "14pt" },
  twoCol: { flexDirection: "row", gap: 18, marginBottom: 10 },
  col: { flex: 1 },
  label: { fontSize: 8, lineHeight: "11pt", color: MUTED, textTransform: "uppercase", letterSpacing: 0.6, marginBottom: 2 },
  card: { backgroundColor: PAPER_TINT, borderRadius: 3, padding: 10, marginBottom: 8 },
  finding: { borderLeftWidth: 3, paddingLeft: 8, marginBottom: 7 },
  bullet: { flexDirection: "row", marginBottom: 3 },
  bulletMark: { width: 12, lineHeight: "14pt" },
  bulletText: { flex: 1, lineHeight: "14pt" },
  figureRow: { flexDirection: "row", justifyContent: "space-between", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 3 },
  figureStrong: { fontWeight: 700 },
  priceBox: { borderWidth: 1, borderColor: ACCENT, borderRadius: 3, padding: 10, marginTop: 6, marginBottom: 6 },
  caption: { fontSize: 8.5, color: INK, lineHeight: "12pt", marginTop: 3 },
  glance: { borderWidth: 0.75, borderColor: RULE, borderRadius: 3, padding: 8, marginBottom: 6 },
  note: { fontSize: 8, color: INK, lineHeight: "11pt", marginBottom: 3 },
  cancelForm: { borderWidth: 0.75, borderColor: INK, borderStyle: "dashed", padding: 8, marginTop: 4 },
  caution: { borderWidth: 0.75, borderColor: "#b4411b", borderRadius: 3, padding: 8, marginBottom: 6, fontSize: 9, lineHeight: "12.5pt" },
  sigRow: { flexDirection: "row", gap: 24, marginTop: 12 },
  sigBox: { flex: 1 },
  sigLine: { minHeight: 52, borderBottomWidth: 1, borderBottomColor: INK, justifyContent: "flex-end", paddingBottom: 3, marginBottom: 4 },
  sigImage: { height: 44, width: 160, objectFit: "contain" },
  typedSig: { fontSize: 16, fontWeight: 600, lineHeight: "21pt", marginBottom: 4 },
  table: { borderTopWidth: 0.5, borderTopColor: RULE, marginTop: 4 },
  cell: { fontSize: 9, lineHeight: "12.5pt" },
  mono: { fontSize: 8, color: INK, lineHeight: "11pt" },
});

const severityColour = { critical: "#b4411b", warning: "#b7791f", info: "#5d646d" } as const;
const sqIn = (n: number) => `${formatNumber(n)} sq in`;
const sqFt = (n: number) => `${formatNumber(n)} sq ft`;

export function formatDate(iso: string): string {
  const d = new Date(iso.length === 10 ? `${iso}T12:00:00Z` : iso);
  return new Intl.DateTimeFormat("en-US", { year: "numeric", month: "long", day: "numeric", timeZone: "UTC" }).format(d);
}

function Bullets({ items }: { items: string[] }) {
  return (
    <View>
      {items.map((item, i) => (
        <View key={i} style={s.bullet} wrap={false}>
          <Text style={s.bulletMark}>•</Text>
          <Text style={s.bulletText}>{item}</Text>
        </View>
      ))}
    </View>
  );
}

function Figure({ label, value, isStrong }: { label: string; value: string; isStrong?: boolean }) {
  return (
    <View style={s.figureRow}>
      <Text style={isStrong ? [s.body, s.figureStrong] : s.body}>{label}</Text>
      <Text style={isStrong ? [s.body, s.figureStrong] : s.body}>{value}</Text>
    </View>
  );
}

function Figures({ analysis }: { analysis: SnapshotAnalysis }) {
  const r = analysis.requirement;
  return (
    <View wrap={false}>
      <Figure label="Attic floor area" value={sqFt(analysis.floorAreaSqFt)} />
      <Figure
        label={r.totalSqIn === 0 ? "Code minimum (sealed attic, IRC R806.5: none)" : `Code minimum (1 sq ft per ${r.ratio} sq ft of floor, rounded up)`}
        value={sqIn(r.totalSqIn)}
        isStrong
      />
      <Figure label="Intake the code split implies, at least (low, at the eaves)" value={sqIn(r.lowerMinSqIn)} />
      <Figure label="Exhaust the split implies (high, near the ridge)" value={`${sqIn(r.upperMinSqIn)} – ${sqIn(r.upperMaxSqIn)}`} />
      <Figure label="Intake provided" value={sqIn(analysis.provided.intakeSqIn)} />
      <Figure label="Exhaust provided" value={sqIn(analysis.provided.exhaustSqIn)} />
      <Figure label="Total provided" value={sqIn(analysis.provided.totalSqIn)} isStrong />
      {analysis.fan ? <Figure label="Powered fan: installed / recommended" value={`${formatNumber(analysis.fan.installedCfm)} / ${formatNumber(analysis.fan.recommendedCfm)} cfm`} /> : null}
      <Figure label="Meets the code minimum" value={analysis.compliant ? "Yes" : "No"} isStrong />
    </View>
  );
}

/**
 * What each picture prints under it: its captions and the legend entries not already printed
 * under an earlier picture, so a note or a key is read once in the document.
 */
export type PictureNotes = Map<AirflowPicture, { captions: string[]; legend: string[] }>;

export function pictureNotes(pictures: readonly AirflowPicture[]): PictureNotes {
  const seen = new Set<string>();
  const notes: PictureNotes = new Map();
  const firstTime = (text: string) => (seen.has(text) ? false : (seen.add(text), true));
  for (const picture of pictures) {
    notes.set(picture, {
      captions: picture.captions.map((c) => c.text).filter(firstTime),
      legend: picture.legend.map((l) => l.words).filter(firstTime),
    });
  }
  return notes;
}

/** As wide as the page allows while at most PICTURE_MAX_HEIGHT_PT tall, so an option's picture, price and figures share one page. */
const PICTURE_MAX_HEIGHT_PT = 160;
/** The figures printed beside an option's "after" picture. */
const BESIDE_WIDTH_PT = 190;
/** Notes kept in one block with their picture; more flow after it. */
const PICTURE_NOTES_KEPT = 8;
const pictureWidthPt = (picture: AirflowPicture) => Math.min(CONTENT_WIDTH_PT, (PICTURE_MAX_HEIGHT_PT * picture.viewBox.widthFt) / picture.viewBox.heightFt);

/** The pictures in the order the document prints them. */
function picturesInOrder(snapshot: ProposalSnapshot): AirflowPicture[] {
  return [...snapshot.before, ...snapshot.options.flatMap((o) => o.after)].map((s) => s.picture).filter((p): p is AirflowPicture => Boolean(p));
}

function Picture({ space, heading, sectionTitle, notes, beside }: { space: SnapshotSpace; heading: string; sectionTitle?: string; notes: PictureNotes; beside?: ReactNode }) {
  if (!space.picture) return null;
  const own = notes.get(space.picture) ?? { captions: [], legend: [] };
  const svg = <AirflowSvg picture={space.picture} widthPt={beside ? Math.min(pictureWidthPt(space.picture), CONTENT_WIDTH_PT - BESIDE_WIDTH_PT - 12) : pictureWidthPt(space.picture)} />;
  // The notes printed right under the picture, in one block with it; on a crowded attic the rest
  // follow as running text (a block taller than a page could not move to the next one whole).
  const notesText = [...own.captions, ...own.legend];
  const kept = notesText.slice(0, PICTURE_NOTES_KEPT);
  const flowing = notesText.slice(PICTURE_NOTES_KEPT);
  return (
    <>
    {/* One block, the full width of the page: a page never starts with a picture's notes cut off
        from it, and a section's title that opens with the picture never ends a page alone. */}
    <View style={{ marginBottom: flowing.length ? 0 : 6, width: CONTENT_WIDTH_PT }} wrap={false}>
      {sectionTitle ? <Text style={s.h2}>{sectionTitle}</Text> : null}
      <Text style={s.h3}>{heading}</Text>
      {beside ? (
        <View style={{ flexDirection: "row", gap: 12, alignItems: "center" }}>
          {svg}
          <View style={{ width: BESIDE_WIDTH_PT }}>{beside}</View>
        </View>
      ) : (
        svg
      )}
      {kept.map((c, i) => (
        <Text key={i} style={s.caption}>{c}</Text>
      ))}
    </View>
    {flowing.map((c, i) => (
      <Text key={i} style={[s.caption, i === flowing.length - 1 ? { marginBottom: 6 } : {}]}>{c}</Text>
    ))}
    </>
  );
}

function groupBySpace<T extends { code: string; space: string }>(findings: readonly T[]): (T & { spaces: string[] })[] {
  const byCode = new Map<string, T & { spaces: string[] }>();
  for (const f of findings) {
    const seen = byCode.get(f.code);
    if (seen) seen.spaces.push(f.space);
    else byCode.set(f.code, { ...f, spaces: [f.space] });
  }
  return [...byCode.values()];
}

/** Each line once, in the order first written (a scope edited by hand can repeat one). */
const unique = (lines: readonly string[]) => [...new Set(lines.map((l) => l.trim()).filter(Boolean))];

function AtAGlance({ snapshot }: { snapshot: ProposalSnapshot }) {
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={90}>{snapshot.options.length === 1 ? "What we propose" : `Your ${snapshot.options.length} options at a glance`}</Text>
      {snapshot.options.map((o, i) => {
        const fixes = optionFixes(snapshot.before, o);
        return (
          <View key={o.id} style={s.glance} wrap={!isShort(o.name, fixes.fixed.join("; "), fixes.left.join("; "))}>
            <View style={{ flexDirection: "row", justifyContent: "space-between", gap: 12 }}>
              <Text style={[s.body, { fontWeight: 700, flex: 1 }]}>Option {i + 1}: {o.name}</Text>
              <Text style={[s.body, { fontWeight: 700 }]}>{o.price ? formatCents(o.price.totalCents) : "Price to be confirmed"}</Text>
            </View>
            {o.price && o.price.depositCents > 0 ? <Text style={s.small}>Deposit when you sign: {formatCents(o.price.depositCents)}</Text> : null}
            <Text style={s.small}>{fixes.meetsCode ? "Meets the building code minimum." : "Does not on its own bring the attic to the building code minimum."}</Text>
            {fixes.fixed.length ? <Text style={s.small}>Fixes: {fixes.fixed.join("; ")}.</Text> : null}
            {fixes.left.length ? <Text style={s.small}>Leaves as it is: {fixes.left.join("; ")}.</Text> : null}
          </View>
        );
      })}
    </View>
  );
}

/** Text short enough (about 15 lines of body type) to keep as one block that moves to the next page whole. */
const isShort = (...texts: string[]) => texts.reduce((n, t) => n + t.length, 0) <= 1_400;

/**
 * Whether an option's heading, notes, scope and price surely fit on one page: at most about 30
 * printed lines of scope and notes (a line holds about 95 characters of body type) besides the price.
 */
function fitsOnAPage(option: SnapshotOption): boolean {
  const lines = [homeownerNotes(option.notes) ?? "", ...unique(option.scope)].reduce((n, text) => n + Math.max(1, Math.ceil(text.length / 95)), 0);
  return lines <= 30;
}

function OptionSection({ option, index, notes }: { option: SnapshotOption; index: number; notes: PictureNotes }) {
  const price = option.price;
  return (
    // Options follow on from each other: an option starts a page only when its heading, scope and
    // price don't fit on the one before (they move as one block), so two options fit in 5 pages. A
    // block longer than a page can't move whole: a long scope flows, its heading kept with it.
    // (A fragment, not a View: react-pdf 4 fails on a View whose first child, unbreakable, moves to
    // the next page with a picture in it: "unsupported number: Infinity".)
    <>
      <View wrap={!fitsOnAPage(option)} style={{ marginTop: 6 }}>
      <Text style={s.h2} minPresenceAhead={90}>Option {index + 1}: {option.name}</Text>
      {homeownerNotes(option.notes) ? <Text style={s.para}>{homeownerNotes(option.notes)}</Text> : null}
      <Text style={s.h3}>What we would do</Text>
      <Bullets items={unique(option.scope)} />
      {price ? (
        <View style={s.priceBox} wrap={false}>
          <Text style={s.label}>Price of option {index + 1}</Text>
          <Figure label="Subtotal" value={formatCents(price.subtotalCents)} />
          {price.discountCents > 0 ? <Figure label="Discount" value={`− ${formatCents(price.discountCents)}`} /> : null}
          <Figure label={`Sales tax (${formatBasisPoints(price.taxRateBasisPoints)})`} value={formatCents(price.taxCents)} />
          <Figure label="Total" value={formatCents(price.totalCents)} isStrong />
          {price.depositCents > 0 ? <Figure label="Deposit due at signing" value={formatCents(price.depositCents)} /> : null}
        </View>
      ) : (
        <Text style={s.para}>This option could not be priced; ask us for the figure.</Text>
      )}
      </View>
      {option.after.map((space) => (
        <Fragment key={space.spaceId}>
          {space.picture ? (
            <Picture
              space={space}
              heading={option.after.length > 1 ? `${space.name} after option ${index + 1}` : `Your attic after option ${index + 1}`}
              notes={notes}
              beside={space.analysis ? <AfterFigures analysis={space.analysis} /> : <Bullets items={space.issues} />}
            />
          ) : space.analysis ? (
            <AfterFigures analysis={space.analysis} />
          ) : (
            <Bullets items={space.issues} />
          )}
        </Fragment>
      ))}
    </>
  );
}

/** The attic after the work in four lines: enough to compare with today's figures. */
function AfterFigures({ analysis }: { analysis: SnapshotAnalysis }) {
  return (
    <View wrap={false}>
      <Figure label="Intake, at the eaves" value={sqIn(analysis.provided.intakeSqIn)} />
      <Figure label="Exhaust, near the ridge" value={sqIn(analysis.provided.exhaustSqIn)} />
      <Figure label="Total provided" value={sqIn(analysis.provided.totalSqIn)} isStrong />
      <Figure label="Code minimum" value={sqIn(analysis.requirement.totalSqIn)} />
      <Figure label="Meets the code minimum" value={analysis.compliant ? "Yes" : "No"} isStrong />
    </View>
  );
}

const SAID_BY_REASONS: ReadonlySet<string> = new Set(["below-minimum", "exception-not-met"]);

/** The rule, the inputs and the arithmetic behind today's figures, in small type under them; each line once in the document. */
function SpaceNotes({ space, seen }: { space: SnapshotSpace; seen: Set<string> }) {
  const once = (text: string) => (text && !seen.has(text) ? (seen.add(text), true) : false);
  const reasons = (space.analysis?.requirement.reasons ?? []).filter(once);
  // The requirement's reasons already give the arithmetic of a shortfall and of the 1/300 conditions.
  const details = homeownerFindings(space.analysis?.findings ?? []).filter((f) => !SAID_BY_REASONS.has(f.code) && once(f.detail));
  if (!reasons.length && !details.length) return null;
  return (
    <View style={{ marginTop: 6 }}>
      <Text style={s.h3} minPresenceAhead={40}>The rules and the arithmetic</Text>
      {reasons.map((r, i) => <Text key={`r${i}`} style={s.note}>{r}</Text>)}
      {details.map((f, i) => (
        <Text key={`${f.code}-${i}`} style={s.note}>
          <Text style={{ fontWeight: 600 }}>{f.title}. </Text>
          {f.detail}
        </Text>
      ))}
    </View>
  );
}

/** The buyer's right to cancel; the notice-of-cancellation form itself is kept on one page so it can be cut out and sent. */
function CancellationNotice({ notice }: { notice: string[] }) {
  const formAt = notice.indexOf("NOTICE OF CANCELLATION");
  const lead = formAt >= 0 ? notice.slice(0, formAt) : notice;
  const form = formAt >= 0 ? notice.slice(formAt) : [];
  return (
    <View>
      <Text style={s.h2} minPresenceAhead={90}>Your right to cancel</Text>
      {lead.map((p, i) => <Text key={i} style={s.para}>{p}</Text>)}
      {form.length ? (
        <View wrap={false} style={s.cancelForm}>
          {form.map((p, i) => (
            <Text key={i} style={i === 0 ? [s.h3, { textAlign: "center", fontSize: 11 }] : s.note}>{p}</Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

export interface SignedPart {
  acceptance: ProposalAcceptance;
  /** The drawn signature's bytes as a data URL, read back from storage. */
  signaturePngDataUrl: string | null;
  originalPdfSha256: string | null;
  snapshotSha256: string;
  events: { event: string; at: string; ip: string | null; userAgent: string | null }[];
}

/** The whole proposal; with `signed`, the homeowner's signature and a signing certificate page. */
export function ProposalDocument({ snapshot, logoDataUrl, photoDataUrls, signed, verifyUrl }: {
  snapshot: ProposalSnapshot;
  logoDataUrl: string | null;
  photoDataUrls: Record<string, string>;
  signed?: SignedPart;
  verifyUrl: string;
}) {
  const c = snapshot.company;
  const footerLeft = `${c.name} · Proposal ${snapshot.proposalId.slice(0, 8)} rev. ${snapshot.revision}`;
  const accepted = signed ? snapshot.options.find((o) => o.id === signed.acceptance.optionId) : undefined;
  // One entry per finding, naming every space it was found in, so its sentence is read once.
  const findings = groupBySpace(snapshot.before.flatMap((space) => homeownerFindings(space.analysis?.findings ?? []).map((f) => ({ ...f, space: space.name }))));
  const notes = pictureNotes(picturesInOrder(snapshot));
  const notesSeen = new Set<string>();
  const todayTitle = snapshot.before.length > 1 ? "Your attics today" : "Your attic today";
  return (
    <Document title={`Proposal for ${snapshot.customer.name}`} author={c.name} subject="Attic ventilation proposal" creator="Eavesight" producer="Eavesight">
      <Page size="LETTER" style={s.page}>
        <View style={s.footer} fixed>
          <Text style={s.footerLeft}>{footerLeft} · check a copy at {verifyUrl}</Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>

        <View style={s.coverBand}>
          <View style={{ flex: 1 }}>
            <Text style={s.company}>{c.name}</Text>
            {c.licenseNumber ? <Text style={s.small}>Licence no. {c.licenseNumber}</Text> : null}
            {c.addressLine ? <Text style={s.small}>{c.addressLine}</Text> : null}
            <Text style={s.small}>{[c.phone, c.email].filter(Boolean).join(" · ")}</Text>
          </View>
          {logoDataUrl ? <Image src={logoDataUrl} style={s.logo} /> : null}
        </View>

        <Text style={s.title}>Attic ventilation proposal</Text>
        <Text style={s.small}>Revision {snapshot.revision} · prepared {formatDate(snapshot.preparedAt)} · valid until {formatDate(snapshot.validUntil)}</Text>

        <View style={[s.twoCol, { marginTop: 14 }]}>
          <View style={[s.col, { flex: 1.4 }]}>
            <Text style={s.label}>Prepared for</Text>
            <Text style={[s.body, { fontWeight: 600 }]}>{snapshot.customer.name}</Text>
            {snapshot.customer.email ? <Text style={s.small}>{breakLongToken(snapshot.customer.email, 40)}</Text> : null}
            {snapshot.customer.phone ? <Text style={s.small}>{snapshot.customer.phone}</Text> : null}
          </View>
          <View style={s.col}>
            <Text style={s.label}>Site</Text>
            <Text style={s.body}>{snapshot.site.address}</Text>
            <Text style={s.small}>{snapshot.site.projectTitle}</Text>
          </View>
          <View style={s.col}>
            <Text style={s.label}>Your contact</Text>
            <Text style={s.body}>{snapshot.seller.name}</Text>
            {snapshot.seller.email ? <Text style={s.small}>{breakLongToken(snapshot.seller.email, 28)}</Text> : null}
          </View>
        </View>

        {snapshot.coverNote ? (
          <View style={s.card}>
            {snapshot.coverNote.split(/\n+/).map((p, i) => <Text key={i} style={s.para}>{p}</Text>)}
          </View>
        ) : null}

        <AtAGlance snapshot={snapshot} />

        <Text style={s.h2} minPresenceAhead={90}>What we found</Text>
        {snapshot.explanation[0] ? <Text style={s.para}>{snapshot.explanation[0]}</Text> : null}
        {findings.map((f, i) => (
          <View key={i} style={[s.finding, { borderLeftColor: severityColour[f.severity] }]} wrap={!isShort(f.title, f.spaces.join(", "), f.plain ?? "")}>
            <Text style={[s.body, { fontWeight: 600 }]}>{f.title}{snapshot.before.length > 1 ? ` (${f.spaces.join(", ")})` : ""}</Text>
            {f.plain ? <Text style={s.body}>{f.plain}</Text> : null}
          </View>
        ))}

        <>
          {snapshot.before[0]?.analysis && snapshot.before[0].picture ? null : <Text style={s.h2}>{todayTitle}</Text>}
          {snapshot.before.map((space, i) => (
            <Fragment key={space.spaceId}>
              {space.analysis ? (
                <>
                  <Picture
                    space={space}
                    sectionTitle={i === 0 ? todayTitle : undefined}
                    heading={snapshot.before.length > 1 ? `How air moves in the ${space.name.toLowerCase()}` : "How air moves through the attic"}
                    notes={notes}
                  />
                  <Figures analysis={space.analysis} />
                  <SpaceNotes space={space} seen={notesSeen} />
                </>
              ) : (
                <>
                  <Text style={s.h3} minPresenceAhead={60}>{space.name}: not analysed</Text>
                  <Bullets items={space.issues} />
                </>
              )}
            </Fragment>
          ))}
        </>

        {snapshot.options.map((option, i) => <OptionSection key={option.id} option={option} index={i} notes={notes} />)}

        <AirflowEstimatesPdf
          spaces={snapshot.before.map((b) => ({ name: b.name, before: b.airflow, afters: snapshot.options.map((o) => o.after.find((a) => a.spaceId === b.spaceId)?.airflow) }))}
        />

        {snapshot.photos.length ? (
          <View break>
            <Text style={s.h2} minPresenceAhead={90}>Photos from the survey</Text>
            <View style={{ flexDirection: "row", flexWrap: "wrap", gap: 10 }}>
              {snapshot.photos.map((p) => photoDataUrls[p.id] ? (
                <View key={p.id} style={{ width: 240 }} wrap={false}>
                  <Image src={photoDataUrls[p.id]!} style={{ width: 240, height: 170, objectFit: "cover" }} />
                  {p.caption ? <Text style={s.caption}>{p.caption}</Text> : null}
                </View>
              ) : null)}
            </View>
          </View>
        ) : null}

        <View>
          <Text style={s.h2} minPresenceAhead={90}>Terms</Text>
          {(snapshot.terms ?? "Payment terms and warranty are as agreed with your contact.").split(/\n+/).map((p, i) => <Text key={i} style={s.para}>{p}</Text>)}
          <Text style={s.para}>This proposal is valid until {formatDate(snapshot.validUntil)}. Prices are in US dollars and include the sales tax shown.</Text>
        </View>

        <View>
          {unique(snapshot.cautions).map((text, i) => (
            // The heading travels with the first caution, so it never ends a page alone.
            <View key={i} wrap={false}>
              {i === 0 ? <Text style={s.h2}>Safety and codes</Text> : null}
              <Text style={s.caution}>{text}</Text>
            </View>
          ))}
        </View>

        <View wrap={false} style={{ marginTop: 16 }}>
          <Text style={s.h2} minPresenceAhead={90}>Signatures</Text>
          <Text style={s.para}>
            {accepted ? `Accepted: option ${snapshot.options.indexOf(accepted) + 1}, ${accepted.name}${accepted.price ? `, total ${formatCents(accepted.price.totalCents)}` : ""}.` : "To accept, choose one option and sign. Option accepted: ______________________"}
          </Text>
          <View style={s.sigRow}>
            <View style={s.sigBox}>
              <View style={s.sigLine}>
                {signed?.signaturePngDataUrl ? <Image src={signed.signaturePngDataUrl} style={s.sigImage} /> : null}
                {signed?.acceptance.signature.typed ? <Text style={s.typedSig}>{signed.acceptance.signature.typed}</Text> : null}
              </View>
              <Text style={s.body}>{signed ? signed.acceptance.signerName : "Homeowner"}</Text>
              <Text style={s.small}>{signed ? `Signed electronically ${signed.acceptance.acceptedAt.replace("T", " ").slice(0, 19)} UTC` : "Signature and date"}</Text>
            </View>
            <View style={s.sigBox}>
              <View style={s.sigLine}>
                {snapshot.seller.signature?.pngDataUrl ? <Image src={snapshot.seller.signature.pngDataUrl} style={s.sigImage} /> : null}
                {snapshot.seller.signature?.typed ? <Text style={s.typedSig}>{snapshot.seller.signature.typed}</Text> : null}
              </View>
              <Text style={s.body}>{snapshot.seller.name}, for {c.name}</Text>
              <Text style={s.small}>{snapshot.seller.signature ? "Signed electronically when sent" : "Not yet signed (draft)"}</Text>
            </View>
          </View>
        </View>

        {snapshot.coolingOff.isEnabled ? <CancellationNotice notice={snapshot.coolingOff.notice} /> : null}

      </Page>

      {signed ? (
        <Page size="LETTER" style={s.page}>
          <View style={s.footer} fixed>
            <Text style={s.footerLeft}>{footerLeft} · signing certificate · check a copy at {verifyUrl}</Text>
            <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
          </View>
          <Text style={s.title}>Signing certificate</Text>
          <Text style={s.para}>This page records how the proposal was signed. The document fingerprints (SHA-256) let anyone check the files against our record.</Text>
          <View style={s.table}>
            <Figure label="Signer" value={signed.acceptance.signerName} />
            <Figure label="Option accepted" value={accepted ? `${snapshot.options.indexOf(accepted) + 1}: ${accepted.name}` : signed.acceptance.optionId} />
            <Figure label="Signed at (UTC)" value={signed.acceptance.acceptedAt} />
            <Figure label="Signature" value={signed.acceptance.signature.typed ? "Typed name" : "Drawn on screen"} />
            <Figure label="IP address" value={signed.acceptance.ip ?? "unknown"} />
            <Figure label="Link id" value={signed.acceptance.tokenId ?? "—"} />
            <Figure label="Consent to e-sign, text version" value={signed.acceptance.consentTextVersion} />
          </View>
          <Text style={s.h3} minPresenceAhead={60}>Browser</Text>
          <Text style={s.mono}>{signed.acceptance.userAgent ?? "unknown"}</Text>
          <Text style={s.h3} minPresenceAhead={60}>Fingerprints</Text>
          <Text style={s.mono}>Proposal content (snapshot) SHA-256: {signed.snapshotSha256}</Text>
          <Text style={s.mono}>Proposal PDF as sent, SHA-256: {signed.originalPdfSha256 ?? "—"}</Text>
          {signed.acceptance.signature.pngSha256 ? <Text style={s.mono}>Drawn signature image SHA-256: {signed.acceptance.signature.pngSha256}</Text> : null}
          <Text style={s.h3} minPresenceAhead={60}>Trail</Text>
          {signed.events.map((e, i) => (
            <View key={i} style={s.figureRow} wrap={false}>
              <Text style={s.cell}>{e.event}</Text>
              <Text style={s.cell}>{e.at}{e.ip ? ` · ${e.ip}` : ""}</Text>
            </View>
          ))}
          <Text style={[s.para, { marginTop: 10 }]}>Check a copy of this signed PDF at {verifyUrl}: choose the file there and the page says whether it is this signed original, unchanged. The fingerprint of this PDF is recorded when it is made.</Text>
        </Page>
      ) : null}
    </Document>
  );
}
