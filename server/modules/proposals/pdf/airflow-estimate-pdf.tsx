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

export interface AirflowEstimateSpace {
  name: string;
  before: SnapshotAirflow | null | undefined;
  /** One per option, in the options' order (null where the option has no estimate for this space). */
  afters: (SnapshotAirflow | null | undefined)[];
}

/**
 * One table per attic space: now, and after each option, side by side, so each row label and the
 * estimate's note print once in the whole document.
 */
export function AirflowEstimatesPdf({ spaces }: { spaces: AirflowEstimateSpace[] }) {
  const shown = spaces.filter((sp) => sp.before && sp.afters.some(Boolean));
  const first = shown[0];
  const note = first ? (first.afters.find(Boolean) ?? first.before)! : null;
  if (!first || !note) return null;
  return (
    <View style={{ marginTop: 6, marginBottom: 8 }}>
      {shown.map((sp, spaceIndex) => {
        const perOption = sp.afters.map((after) => (after ? new Map(beforeAfterRows(sp.before!, after).map((r) => [`${r.season}:${r.label}`, r])) : null));
        const keys = [...new Map(perOption.flatMap((m) => (m ? [...m.entries()] : []))).entries()];
        const cautions = sp.afters.flatMap((after, i) => (after ? [after.summer, after.winter].filter((x) => x.isOverLimit).map((x) => `Option ${i + 1}: ${x.depressurizationSentence}`) : []));
        return (
          // The heading travels with the first table, so it never ends a page alone.
          <View key={sp.name} wrap={false} style={{ marginBottom: 6 }}>
            {spaceIndex === 0 ? <Text style={{ fontSize: 13, fontWeight: 600, lineHeight: "17pt", marginBottom: 4 }}>Where the air goes: now, and after each option</Text> : null}
            <View style={{ borderTopWidth: 0.5, borderTopColor: RULE }}>
              <View style={{ flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2 }}>
                <Text style={[cell, { flex: 3, color: MUTED }]}>Estimate</Text>
                <Text style={[cell, { flex: 1.2, color: MUTED, textAlign: "right" }]}>Now</Text>
                {sp.afters.map((_, i) => (
                  <Text key={i} style={[cell, { flex: 1.2, color: MUTED, textAlign: "right" }]}>Option {i + 1}</Text>
                ))}
              </View>
              {keys.map(([key, row]) => (
                <View key={key} style={{ flexDirection: "row", borderBottomWidth: 0.5, borderBottomColor: RULE, paddingVertical: 2 }}>
                  <Text style={[cell, { flex: 3 }]}>{shown.length > 1 ? `${sp.name}, ${row.season}` : row.season === "summer" ? "Summer" : "Winter"}: {row.label}</Text>
                  <Text style={[cell, { flex: 1.2, textAlign: "right" }]}>{row.before}</Text>
                  {perOption.map((m, i) => (
                    <Text key={i} style={[cell, { flex: 1.2, textAlign: "right", fontWeight: 700 }]}>{m?.get(key)?.after ?? "–"}</Text>
                  ))}
                </View>
              ))}
            </View>
            {cautions.map((c) => (
              <Text key={c} style={{ fontSize: 9, lineHeight: "12.5pt", color: CAUTION, marginTop: 3 }}>{c}</Text>
            ))}
          </View>
        );
      })}
      <Text style={{ fontSize: 8, color: MUTED, lineHeight: "11pt", marginTop: 3 }}>
        {note.disclaimer} Conditions: {note.summer.conditionsText}; {note.winter.conditionsText}. Assumptions: {note.assumptions.join(" ")}
      </Text>
    </View>
  );
}
