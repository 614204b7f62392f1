import { Document, Image, Page, StyleSheet, Text, View, renderToBuffer } from "@react-pdf/renderer";
import sharp from "sharp";
import type { CompletionReport, ReportFigures } from "../../../../shared/jobs/completion-report.ts";
import { formatCents } from "../../../../shared/pricing/index.ts";
import { formatNumber } from "../../../../shared/units/format.ts";
import { PLEX_FAMILIES, registerFonts } from "./fonts.ts";

// The proposal's look (proposal-document.tsx, change-order-document.tsx): the same ink, accent, rules and type scale.
const INK = "#22262b";
const MUTED = "#5d646d";
const RULE = "#d5d9de";
const ACCENT = "#1f5c4a";

const s = StyleSheet.create({
  page: { paddingTop: 40, paddingBottom: 48, paddingHorizontal: 46, fontFamily: PLEX_FAMILIES as unknown as string, fontSize: 9.5, color: INK },
  footer: { position: "absolute", bottom: 22, left: 46, right: 46, fontSize: 8, color: MUTED, borderTopWidth: 0.5, borderTopColor: RULE, paddingTop: 6 },
  band: { borderBottomWidth: 2, borderBottomColor: ACCENT, paddingBottom: 10, marginBottom: 12 },
  company: { fontSize: 16, fontWeight: 700, color: ACCENT, lineHeight: "21pt" },
  small: { fontSize: 8.5, color: MUTED, lineHeight: "12pt" },
  title: { fontSize: 18, fontWeight: 700, lineHeight: "23pt", marginBottom: 3 },
  h2: { fontSize: 12, fontWeight: 700, color: ACCENT, lineHeight: "16pt", marginTop: 9, marginBottom: 4 },
  para: { marginBottom: 3, lineHeight: "13pt" },
  bullet: { flexDirection: "row", marginBottom: 2 },
  bulletMark: { width: 10 },
  bulletText: { flex: 1, lineHeight: "13pt" },
  table: { borderTopWidth: 0.5, borderTopColor: RULE },
  row: { flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2.5 },
  cellName: { width: "34%" },
  cell: { width: "22%", textAlign: "right" },
  strong: { fontWeight: 700 },
  photos: { flexDirection: "row", flexWrap: "wrap", gap: 6 },
  photo: { width: 122 },
  photoImage: { width: 122, height: 90, objectFit: "cover" },
  money: { borderWidth: 1, borderColor: ACCENT, borderRadius: 3, padding: 8, marginTop: 8 },
  moneyRow: { flexDirection: "row", justifyContent: "space-between", paddingVertical: 1.5 },
});

/** At most about three lines under a photo, cut at a word. */
const shortCaption = (caption: string | null) => {
  const text = caption ?? "";
  if (text.length <= 80) return text;
  return `${text.slice(0, 80).replace(/\s+\S*$/, "")}…`;
};
const sqIn = (n: number) => `${formatNumber(n, { maxFractionDigits: 1 })} sq in`;
const verdict = (f: ReportFigures | null) => (f ? (f.isCompliant ? "meets the minimum" : "below the minimum") : "—");

/**
 * The completion report as one page in the proposal's look: what was installed, the core's before
 * and after figures, photos of the finished work, the balance and the warranty.
 */
export function CompletionDocument({ report: r, photos }: { report: CompletionReport; photos: { caption: string | null; dataUrl: string }[] }) {
  return (
    <Document title={`Completion report — ${r.site.address}`} author={r.company.name} creator="Eavesight" producer="Eavesight">
      <Page size="LETTER" style={s.page}>
        <Text style={s.footer} fixed>
          {r.company.name}{r.company.phone ? ` · ${r.company.phone}` : ""}{r.company.email ? ` · ${r.company.email}` : ""} · Completion report for {r.site.address}
        </Text>
        <View style={s.band}>
          <Text style={s.company}>{r.company.name}</Text>
          <Text style={s.small}>{[r.company.addressLine, r.company.phone, r.company.email, r.company.licenseNumber ? `Licence ${r.company.licenseNumber}` : null].filter(Boolean).join(" · ")}</Text>
        </View>
        <Text style={s.title}>Your attic work is finished</Text>
        <Text style={s.para}>For {r.customer.name}, {r.site.address}. Completed {r.completedOn} by {r.crewName}: "{r.optionName}", {r.checkedCount} steps checked, {r.photographedCount} photographed.</Text>

        <Text style={s.h2}>What we installed</Text>
        {r.installed.map((line, i) => (
          <View key={i} style={s.bullet} wrap={false}><Text style={s.bulletMark}>•</Text><Text style={s.bulletText}>{line}</Text></View>
        ))}

        <Text style={s.h2}>Ventilation before and after</Text>
        <View style={s.table}>
          <View style={s.row}>
            <Text style={[s.cellName, s.strong]}>Space</Text><Text style={[s.cell, s.strong]}>Code minimum</Text>
            <Text style={[s.cell, s.strong]}>Before (in / out)</Text><Text style={[s.cell, s.strong]}>After (in / out)</Text>
          </View>
          {r.spaces.map((space, i) => (
            <View key={i} style={s.row} wrap={false}>
              <Text style={s.cellName}>{space.name}</Text>
              <Text style={s.cell}>{space.after ? sqIn(space.after.requiredSqIn) : "—"}</Text>
              <Text style={s.cell}>{space.before ? `${sqIn(space.before.intakeSqIn)} / ${sqIn(space.before.exhaustSqIn)}` : "—"}{"\n"}{verdict(space.before)}</Text>
              <Text style={s.cell}>{space.after ? `${sqIn(space.after.intakeSqIn)} / ${sqIn(space.after.exhaustSqIn)}` : "—"}{"\n"}{verdict(space.after)}</Text>
            </View>
          ))}
        </View>
        <Text style={s.small}>Net free area of intake (in) and exhaust (out) vents, from the survey and the design you signed.</Text>

        {photos.length > 0 ? (
          <>
            <Text style={s.h2}>The finished work</Text>
            <View style={s.photos}>
              {photos.map((p, i) => (
                <View key={i} style={s.photo} wrap={false}>
                  <Image src={p.dataUrl} style={s.photoImage} />
                  <Text style={s.small}>{shortCaption(p.caption)}</Text>
                </View>
              ))}
            </View>
          </>
        ) : null}

        <View style={s.money} wrap={false}>
          <View style={s.moneyRow}><Text>Job total (signed work and signed changes)</Text><Text>{formatCents(r.money.jobTotalCents)}</Text></View>
          <View style={s.moneyRow}><Text>Paid so far</Text><Text>{formatCents(r.money.paidCents)}</Text></View>
          <View style={s.moneyRow}><Text style={s.strong}>Balance due</Text><Text style={s.strong}>{formatCents(r.balanceCents)}</Text></View>
          {r.balanceCents > 0 ? <Text style={s.small}>Pay it online from the link in our e-mail (the same secure payment page as the deposit), or contact us.</Text> : null}
        </View>

        <Text style={s.h2}>Warranty</Text>
        <Text style={s.para}>{r.warranty}</Text>
        {r.cautions.map((c, i) => <Text key={i} style={s.small}>{c}</Text>)}
      </Page>
    </Document>
  );
}

/** The report as PDF bytes; photos drawn at print size (about 1.7 in wide), as JPEG. */
export async function renderCompletionPdf(report: CompletionReport, photos: { caption: string | null; bytes: Buffer }[]): Promise<Buffer> {
  registerFonts();
  const small = await Promise.all(photos.map(async (p) => ({
    caption: p.caption,
    dataUrl: `data:image/jpeg;base64,${(await sharp(p.bytes).resize(360, 270, { fit: "cover" }).jpeg({ quality: 78 }).toBuffer()).toString("base64")}`,
  })));
  const bytes = await renderToBuffer(<CompletionDocument report={report} photos={small} />);
  await new Promise((resolve) => setImmediate(resolve));
  return bytes;
}
