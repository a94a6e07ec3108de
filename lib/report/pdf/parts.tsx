import { Text, View } from "@react-pdf/renderer";
import type { ReactNode } from "react";
import type { ReportTable } from "../model";
import { C, s } from "./theme";

/** A table with header; `widths` are flex weights per column; numeric columns align right. */
export function Table({ t, widths }: { t: ReportTable; widths?: number[] }) {
  const w = widths ?? t.columns.map(() => 1);
  const cell = (i: number) => ({ flex: w[i] ?? 1, ...(t.numeric[i] ? s.num : {}) });
  return (
    <View style={{ marginBottom: 8 }}>
      <View style={s.tableHead} wrap={false} minPresenceAhead={40} fixed>
        {t.columns.map((c, i) => (
          <Text key={i} style={[s.th, cell(i)]}>
            {c}
          </Text>
        ))}
      </View>
      {t.rows.map((r, k) => (
        <View key={k} style={[s.tableRow, r[1] === "Total" ? { borderBottomColor: C.ink, borderBottomWidth: 0.8 } : {}]} wrap={false}>
          {r.map((v, i) => (
            <Text key={i} style={[s.td, cell(i), r[1] === "Total" ? { fontWeight: 600 } : {}]}>
              {v}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

export function KeyValues({ rows, keyWidth = "34%" }: { rows: [string, string][]; keyWidth?: string }) {
  return (
    <View style={{ marginBottom: 8 }}>
      {rows.map(([k, v], i) => (
        <View key={i} style={s.kvRow} wrap={false}>
          <Text style={[s.kvKey, { width: keyWidth }]}>{k}</Text>
          <Text style={[s.kvVal, { width: `${100 - parseFloat(keyWidth)}%` }]}>{v}</Text>
        </View>
      ))}
    </View>
  );
}

export function Bullets({ items }: { items: string[] }) {
  return (
    <View>
      {items.map((t, i) => (
        <View key={i} style={s.bullet} wrap={false}>
          <Text style={s.bulletMark}>–</Text>
          <Text style={s.bulletText}>{t}</Text>
        </View>
      ))}
    </View>
  );
}

/** A numbered chapter heading that starts a new page when `newPage`. */
/** `lead` stays on the same page as the heading (e.g. the chapter's main plot). */
export function Chapter({ n, title, newPage, keepTogether, lead, children }: { n: number; title: string; newPage?: boolean; keepTogether?: boolean; lead?: ReactNode; children: ReactNode }) {
  return (
    <View break={newPage} wrap={!keepTogether}>
      <View wrap={false} minPresenceAhead={220}>
        <Text style={s.h1Number}>{String(n).padStart(2, "0")}</Text>
        <Text style={s.h1}>{title}</Text>
        <View style={s.rule} />
        {lead}
      </View>
      {children}
    </View>
  );
}

export function H2({ children }: { children: ReactNode }) {
  return (
    <Text style={s.h2} minPresenceAhead={110}>
      {children}
    </Text>
  );
}
