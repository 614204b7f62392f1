import { Document, Page, StyleSheet, Text, View, renderToBuffer } from "@react-pdf/renderer";
import type { ChangeOrderAcceptance, ChangeOrderSnapshot } from "../../../../shared/change-orders/types.ts";
import { formatCents } from "../../../../shared/pricing/index.ts";
import { formatNumber } from "../../../../shared/units/format.ts";
import { PLEX_FAMILIES, registerFonts } from "./fonts.ts";
import { formatDate } from "./proposal-document.tsx";

// The proposal's look (proposal-document.tsx): the same ink, accent, rules and type scale.
const INK = "#22262b";
const MUTED = "#5d646d";
const RULE = "#d5d9de";
const ACCENT = "#1f5c4a";

const s = StyleSheet.create({
  page: { paddingTop: 48, paddingBottom: 56, paddingHorizontal: 50, fontFamily: PLEX_FAMILIES as unknown as string, fontSize: 10, color: INK },
  footer: { position: "absolute", bottom: 24, left: 50, right: 50, flexDirection: "row", justifyContent: "space-between", fontSize: 8, color: MUTED, borderTopWidth: 0.5, borderTopColor: RULE, paddingTop: 6 },
  footerText: { flex: 1, lineHeight: "11pt" },
  band: { borderBottomWidth: 2, borderBottomColor: ACCENT, paddingBottom: 12, marginBottom: 16 },
  company: { fontSize: 16, fontWeight: 700, color: ACCENT, lineHeight: "21pt" },
  small: { fontSize: 8.5, color: MUTED, lineHeight: "12pt" },
  title: { fontSize: 20, fontWeight: 700, lineHeight: "25pt", marginBottom: 4 },
  h2: { fontSize: 13, fontWeight: 700, color: ACCENT, lineHeight: "17pt", marginTop: 12, marginBottom: 6 },
  para: { marginBottom: 5, lineHeight: "14pt" },
  row: { flexDirection: "row", justifyContent: "space-between", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 3, gap: 12 },
  rowText: { flex: 1 },
  strong: { fontWeight: 700 },
  totals: { borderWidth: 1, borderColor: ACCENT, borderRadius: 3, padding: 10, marginTop: 8 },
  sigLine: { minHeight: 40, borderBottomWidth: 1, borderBottomColor: INK, justifyContent: "flex-end", paddingBottom: 3, marginTop: 14, marginBottom: 4 },
  typedSig: { fontSize: 15, fontWeight: 600, lineHeight: "20pt" },
});

const signed = (cents: number) => (cents < 0 ? `− ${formatCents(-cents)}` : `+ ${formatCents(cents)}`);

/** A change order as its own short PDF: what changes and why, the original total, the change and the new total, and the signature. */
export function ChangeOrderDocument({ snapshot: c, acceptance, verifyUrl }: { snapshot: ChangeOrderSnapshot; acceptance: ChangeOrderAcceptance | null; verifyUrl: string }) {
  return (
    <Document title={`Change order ${c.number} — ${c.site.address}`} author={c.company.name} creator="Eavesight" producer="Eavesight">
      <Page size="LETTER" style={s.page}>
        <View style={s.footer} fixed>
          <Text style={s.footerText}>Change order {c.number} · check a copy at {verifyUrl}</Text>
          <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
        </View>
        <View style={s.band}>
          <Text style={s.company}>{c.company.name}</Text>
          <Text style={s.small}>{[c.company.addressLine, c.company.phone, c.company.email, c.company.licenseNumber ? `Licence ${c.company.licenseNumber}` : null].filter(Boolean).join(" · ")}</Text>
        </View>
        <Text style={s.title}>Change order {c.number}</Text>
        <Text style={s.para}>
          For {c.customer.name}, {c.site.address}. Changes the work you signed in proposal revision {c.proposalRevision} ("{c.optionName}"). Prepared {formatDate(c.preparedAt)} by {c.seller.name}.
        </Text>
        <Text style={s.h2}>Why the work changes</Text>
        <Text style={s.para}>{c.reason}</Text>
        <Text style={s.h2}>What changes</Text>
        {c.lines.map((l) => (
          <View key={l.id} style={s.row} wrap={false}>
            <Text style={s.rowText}>
              {l.action === "add" ? "Add" : "Leave out"}: {l.description} — {formatNumber(l.quantity)} {l.unit} × {formatCents(l.unitPriceCents)}
            </Text>
            <Text>{signed(l.action === "add" ? l.totalCents : -l.totalCents)}</Text>
          </View>
        ))}
        <View style={s.totals} wrap={false}>
          <View style={s.row}><Text>Job total before this change</Text><Text>{formatCents(c.previousTotalCents)}</Text></View>
          <View style={s.row}><Text>Work added</Text><Text>{signed(c.totals.addedCents)}</Text></View>
          <View style={s.row}><Text>Work left out</Text><Text>{signed(-c.totals.removedCents)}</Text></View>
          <View style={s.row}><Text>Tax on the change</Text><Text>{signed(c.totals.taxChangeCents)}</Text></View>
          <View style={s.row}><Text style={s.strong}>New job total</Text><Text style={s.strong}>{formatCents(c.newTotalCents)}</Text></View>
        </View>
        <Text style={s.h2}>Signature</Text>
        <Text style={s.para}>Only a signed change order changes the work and the total; until then the signed proposal stands as it is.</Text>
        {acceptance ? (
          <>
            <View style={s.sigLine}><Text style={s.typedSig}>{acceptance.signature.typed ?? acceptance.signerName}</Text></View>
            <Text style={s.small}>Signed electronically by {acceptance.signerName} on {formatDate(acceptance.signedAt)} ({acceptance.signedAt.slice(11, 16)} UTC), consent text {acceptance.consentTextVersion}.</Text>
          </>
        ) : (
          <>
            <View style={s.sigLine} />
            <Text style={s.small}>Homeowner's signature and date</Text>
          </>
        )}
      </Page>
    </Document>
  );
}

export interface ChangeOrderRenderInput {
  snapshot: ChangeOrderSnapshot;
  acceptance: ChangeOrderAcceptance | null;
  verifyUrl: string;
}

/**
 * The change order as PDF bytes, on the calling thread: one short page, a few hundred milliseconds.
 * The server calls it on a compute-pool thread (render-off-thread.ts).
 */
export async function renderChangeOrderPdf(input: ChangeOrderRenderInput): Promise<Buffer> {
  registerFonts();
  const bytes = await renderToBuffer(<ChangeOrderDocument {...input} />);
  await new Promise((resolve) => setImmediate(resolve));
  return bytes;
}
