/**
 * The option's airflow before and after in the proposal PDF (no "→": the embedded font subsets lack it) (issue 19): house air drawn into the
 * attic, attic air changes and the fans' pull on the house, for the company's stated summer and
 * winter conditions, with the plain warning that it is an estimate and its assumptions. Kept in
 * its own component so the document's layout can change around it.
 */
import { Text, View } from "@react-pdf/renderer";
import { beforeAfterRows } from "../../../../shared/airflow-model/index.ts";
import type { SnapshotAirflow } from "../../../../shared/proposals/types.ts";
import { PLEX_FAMILIES } from "./fonts.ts";

const INK = "#22262b";
const MUTED = "#5d646d";
const RULE = "#d5d9de";
const CAUTION = "#b4411b";

const cell = { fontSize: 9, lineHeight: "12.5pt", fontFamily: PLEX_FAMILIES as unknown as string, color: INK } as const;

export function AirflowEstimatePdf({ spaceName, before, after }: { spaceName: string; before: SnapshotAirflow | null | undefined; after: SnapshotAirflow | null | undefined }) {
  if (!before || !after) return null;
  const rows = beforeAfterRows(before, after);
  const afterCautions = [after.summer, after.winter].filter((s) => s.isOverLimit);
  return (
    <View wrap={false} style={{ marginTop: 6, marginBottom: 8 }}>
      <Text style={{ fontSize: 11, fontWeight: 600, lineHeight: "15pt", marginBottom: 3 }}>Where the air goes in {spaceName}: now, and after this option</Text>
      <View style={{ borderTopWidth: 0.5, borderTopColor: RULE }}>
        <View style={{ flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2 }}>
          <Text style={[cell, { flex: 3, color: MUTED }]}>Estimate</Text>
          <Text style={[cell, { flex: 1.2, color: MUTED, textAlign: "right" }]}>Now</Text>
          <Text style={[cell, { flex: 1.2, color: MUTED, textAlign: "right" }]}>After</Text>
        </View>
        {rows.map((row) => (
          <View key={`${row.season}-${row.label}`} style={{ flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2 }}>
            <Text style={[cell, { flex: 3 }]}>{row.season === "summer" ? "Summer" : "Winter"}: {row.label}</Text>
            <Text style={[cell, { flex: 1.2, textAlign: "right" }]}>{row.before}</Text>
            <Text style={[cell, { flex: 1.2, textAlign: "right", fontWeight: 700 }]}>{row.after}</Text>
          </View>
        ))}
      </View>
      {afterCautions.map((season) => (
        <Text key={season.conditionsText} style={{ fontSize: 9, lineHeight: "12.5pt", color: CAUTION, marginTop: 3 }}>{season.depressurizationSentence}</Text>
      ))}
      <Text style={{ fontSize: 8, color: MUTED, lineHeight: "11pt", marginTop: 3 }}>
        {after.disclaimer} Conditions: {after.summer.conditionsText}; {after.winter.conditionsText}. Assumptions: {after.assumptions.join(" ")}
      </Text>
    </View>
  );
}
