import { StyleSheet } from "@react-pdf/renderer";
import { SANS, SERIF } from "./fonts";

/** The report's identity: white paper, ink, one warm accent. */
export const C = {
  ink: "#1f2328",
  soft: "#4a5058",
  faint: "#6b7179",
  line: "#e2dbcd",
  rule: "#cfc6b5",
  tint: "#f7f4ee",
  accent: "#b2572a",
  accentSoft: "#f5dccb",
  caution: "#a06a00",
  cautionSoft: "#fbf3e1",
};

export const s = StyleSheet.create({
  page: { paddingTop: 56, paddingBottom: 58, paddingHorizontal: 54, fontFamily: SANS, fontSize: 9.2, color: C.ink, backgroundColor: "#ffffff", fontFeatureSettings: ["tnum"] } as never,
  header: { position: "absolute", top: 24, left: 54, right: 54, flexDirection: "row", justifyContent: "space-between", fontSize: 7.5, color: C.faint, borderBottomWidth: 0.6, borderBottomColor: C.line, paddingBottom: 5 },
  headerFirm: { color: C.accent, fontWeight: 600, letterSpacing: 0.6, textTransform: "uppercase" },
  footer: { position: "absolute", bottom: 26, left: 54, right: 54, flexDirection: "row", justifyContent: "space-between", fontSize: 7.5, color: C.faint, borderTopWidth: 0.6, borderTopColor: C.line, paddingTop: 5 },
  h1: { lineHeight: 1.2, fontFamily: SERIF, fontSize: 19, fontWeight: 600, color: C.ink, marginBottom: 4 },
  h1Number: { fontFamily: SANS, fontSize: 9, fontWeight: 600, color: C.accent, letterSpacing: 0.8, marginBottom: 2 },
  h2: { lineHeight: 1.25, fontFamily: SERIF, fontSize: 12.5, fontWeight: 600, color: C.ink, marginTop: 14, marginBottom: 5 },
  h3: { lineHeight: 1.3, fontSize: 9.4, fontWeight: 600, color: C.ink, marginTop: 8, marginBottom: 3 },
  p: { marginBottom: 6, fontSize: 9.2, lineHeight: 1.42 },
  lead: { fontFamily: SERIF, fontSize: 11.5, lineHeight: 1.5, marginBottom: 8 },
  small: { fontSize: 7.8, color: C.soft, lineHeight: 1.4 },
  caption: { fontSize: 7.8, color: C.soft, marginTop: 3, marginBottom: 8, lineHeight: 1.4 },
  section: { marginBottom: 6 },
  rule: { borderBottomWidth: 0.8, borderBottomColor: C.accent, width: 36, marginBottom: 10, marginTop: 2 },
  tableHead: { flexDirection: "row", borderBottomWidth: 0.8, borderBottomColor: C.ink, paddingBottom: 2.5, marginBottom: 1 },
  tableRow: { flexDirection: "row", borderBottomWidth: 0.4, borderBottomColor: C.line, paddingVertical: 2.6 },
  th: { fontSize: 7.6, fontWeight: 600, color: C.soft, paddingRight: 6, lineHeight: 1.3 },
  td: { fontSize: 8.4, paddingRight: 6, lineHeight: 1.3 },
  num: { textAlign: "right", fontFeatureSettings: ["tnum"] } as never,
  kvRow: { flexDirection: "row", paddingVertical: 2.4, borderBottomWidth: 0.4, borderBottomColor: C.line },
  kvKey: { width: "34%", color: C.soft, fontSize: 9.2, lineHeight: 1.35 },
  kvVal: { width: "66%", fontWeight: 500, fontSize: 9.2, lineHeight: 1.35 },
  box: { fontSize: 9.2, lineHeight: 1.42, backgroundColor: C.tint, borderRadius: 3, padding: 10, marginVertical: 6 },
  cautionBox: { backgroundColor: C.cautionSoft, borderLeftWidth: 2.5, borderLeftColor: C.caution, padding: 9, marginVertical: 5 },
  bullet: { flexDirection: "row", marginBottom: 4 },
  bulletMark: { width: 12, color: C.accent, fontWeight: 700, fontSize: 9.2, lineHeight: 1.42 },
  bulletText: { flex: 1, fontSize: 9.2, lineHeight: 1.42 },
});
