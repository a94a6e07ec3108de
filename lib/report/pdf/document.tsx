import { Document, Image, Page, Text, View } from "@react-pdf/renderer";
import type { ReportModel } from "../model";
import { SERIF } from "./fonts";
import { BandBarsPlot, ModeSpectrumPlot, PlanDrawing, ResponsePlot } from "./plots";
import { Bullets, Chapter, H2, KeyValues, Table } from "./parts";
import { C, s } from "./theme";

function Chrome({ m }: { m: ReportModel }) {
  return (
    <>
      <View style={s.header} fixed>
        <Text style={s.headerFirm}>{m.firmName}</Text>
        <Text>
          {m.number} · {m.revisionLabel}
        </Text>
      </View>
      <View style={s.footer} fixed>
        <Text>{m.footer}</Text>
        <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </View>
      {m.draft ? (
        <Text fixed style={{ position: "absolute", top: 330, left: 90, fontSize: 64, color: C.accent, opacity: 0.12, transform: "rotate(-35deg)", fontWeight: 700 }}>
          DRAFT — NOT ISSUED
        </Text>
      ) : null}
    </>
  );
}

function Cover({ m }: { m: ReportModel }) {
  return (
    <Page size={m.paperSize} style={[s.page, { paddingTop: 64 }]}>
      <View style={s.footer} fixed>
        <Text>{m.footer}</Text>
        <Text render={({ pageNumber, totalPages }) => `Page ${pageNumber} of ${totalPages}`} />
      </View>
      <Text style={{ color: C.accent, fontWeight: 600, letterSpacing: 1.2, fontSize: 9, textTransform: "uppercase" }}>{m.firmName}</Text>
      <View style={{ borderBottomWidth: 2, borderBottomColor: C.accent, width: 48, marginTop: 10, marginBottom: 90 }} />
      <Text style={{ fontFamily: SERIF, fontSize: 12, color: C.soft, marginBottom: 6 }}>Room acoustics report</Text>
      <Text style={{ fontFamily: SERIF, fontSize: 30, fontWeight: 600, lineHeight: 1.15, marginBottom: 8 }}>{m.cover.find((c) => c[0] === "Room")?.[1]}</Text>
      <Text style={{ fontFamily: SERIF, fontSize: 13, color: C.soft, marginBottom: 48 }}>
        {m.cover.find((c) => c[0] === "Project")?.[1]} · for {m.cover.find((c) => c[0] === "Client")?.[1]}
      </Text>
      <KeyValues rows={m.cover} keyWidth="26%" />
      <View style={{ marginTop: 28, flexDirection: "row", alignItems: "flex-end", justifyContent: "space-between" }}>
        <View>
          <Text style={{ fontSize: 8, color: C.faint }}>Report number</Text>
          <Text style={{ fontSize: 20, lineHeight: 1.25, fontWeight: 600, color: C.ink, letterSpacing: 0.5 }}>{m.number}</Text>
          <Text style={{ fontSize: 9, lineHeight: 1.4, color: C.soft }}>
            {m.revisionLabel} · {m.dateLabel}
          </Text>
        </View>
        <Text style={{ width: 210, fontSize: 7.8, lineHeight: 1.4, color: C.soft, textAlign: "right" }}>
          {m.draft ? "Draft for review. Not signed and not issued: do not act on it." : "Digitally signed. The signature block on the last page says how to check that this copy is genuine."}
        </Text>
      </View>
      {m.draft ? (
        <Text style={{ position: "absolute", top: 360, left: 80, fontSize: 64, color: C.accent, opacity: 0.12, transform: "rotate(-35deg)", fontWeight: 700 }}>DRAFT — NOT ISSUED</Text>
      ) : null}
    </Page>
  );
}

function Method({ x }: { x: { title: string; text: string } }) {
  return (
    <View style={{ marginBottom: 5 }} wrap={false}>
      <Text style={{ fontWeight: 600 }}>{x.title}</Text>
      <Text style={{ fontSize: 9.2, lineHeight: 1.42 }}>{x.text}</Text>
    </View>
  );
}

export function ReportDocument({ m }: { m: ReportModel }) {
  let n = 0;
  const next = () => ++n;
  return (
    <Document title={`${m.number} ${m.title}`} author={m.firmName} subject={`${m.number} ${m.revisionLabel}`} keywords={`${m.number}; ${m.revisionLabel}`} creator="Eigenroom" producer="Eigenroom">
      <Cover m={m} />
      <Page size={m.paperSize} style={s.page}>
        <Chrome m={m} />
        <View>
        <Chapter n={next()} title="Summary">
          <Text style={s.lead}>{m.summary.intro}</Text>
          <H2>What we found</H2>
          <Bullets items={m.summary.problems} />
          <H2>What we recommend</H2>
          <Bullets items={m.summary.recommendation} />
          {m.summary.note ? (
            <View style={s.box}>
              <Text style={[s.small, { fontWeight: 600, color: C.ink, marginBottom: 2 }]}>Note from the engineer</Text>
              <Text style={{ fontSize: 9.2, lineHeight: 1.42 }}>{m.summary.note}</Text>
            </View>
          ) : null}
          <View style={s.cautionBox} wrap={false}>
            <Text style={{ fontWeight: 600, marginBottom: 2 }}>Before any work starts</Text>
            <Text style={{ fontSize: 9.2, lineHeight: 1.42 }}>Building and hanging treatment can hurt people: read the cautions in chapter {5 + (m.lowFrequency ? 1 : 0) + (m.decay ? 1 : 0)} and follow your local building codes. Where in doubt, ask a licensed professional.</Text>
          </View>
          <H2>Scenarios compared</H2>
          <Table t={m.scenarios} widths={[2.6, 0.8, 1.1, 1.1, 1.1, 1.5]} />
        </Chapter>

        <Chapter n={next()} title="The room" newPage>
          <View style={{ flexDirection: "row" }}>
            <View style={{ width: "44%", paddingRight: 14 }}>
              <Table t={m.room.facts} widths={[1.3, 1.2]} />
              <Text style={s.caption}>{m.room.planLegend}</Text>
            </View>
            <View style={{ width: "56%", alignItems: "center" }} wrap={false}>
              <PlanDrawing g={m.room.plan} />
            </View>
          </View>
          <H2>Surfaces</H2>
          <Table t={m.room.surfaces} widths={[1.4, 2.2, 1.6]} />
          <H2>Seats and sources</H2>
          <Text style={s.small}>x from the front wall, y from the left wall (seen from the seats), z above the floor.</Text>
          <Table t={m.room.positions} widths={[0.5, 1.6, 1.2, 0.7, 0.7, 0.7, 1.9]} />
          {m.photos.length > 0 ? (
            <View>
              <H2>Photos</H2>
              {m.photos.map((p, i) => (
                <View key={i} wrap={false} style={{ marginBottom: 8 }}>
                  <Image src={{ data: p.data, format: p.format }} style={{ maxHeight: 220, objectFit: "contain" }} />
                  <Text style={s.caption}>{p.caption}</Text>
                </View>
              ))}
            </View>
          ) : null}
        </Chapter>

        {m.lowFrequency ? (
          <Chapter n={next()} title="Low-frequency findings">
            <KeyValues rows={m.lowFrequency.facts} />
            <Bullets items={m.lowFrequency.verdicts} />
            <H2>Mode spectrum</H2>
            <View wrap={false}>
              <ModeSpectrumPlot g={m.lowFrequency.spectrum} />
              <Text style={s.caption}>Room modes up to 200 Hz by kind; the shaded bar of each stem is its half-power bandwidth. Axial modes are the strongest.</Text>
            </View>
            {m.lowFrequency.responses.map((r, i) => (
              <View key={i} wrap={false}>
                <H2>{`Modal response at ${r.seatName}`}</H2>
                <ResponsePlot g={r.geometry} />
                <Text style={s.caption}>{r.caption}</Text>
              </View>
            ))}
            <H2>Bass evenness at every seat</H2>
            <Table t={m.lowFrequency.seats} widths={[2, 1, 1, 1]} />
            <H2>Lowest modes</H2>
            <Table t={m.lowFrequency.modes} widths={[1.3, 1.2, 1, 1.6]} />
            {m.lowFrequency.notes.map((t, i) => (
              <Text key={i} style={s.small}>
                {t}
              </Text>
            ))}
          </Chapter>
        ) : null}

        {m.decay ? (
          <Chapter
            n={next()}
            title="Decay per band"
            newPage={!m.lowFrequency}
            lead={
              <View>
                <Text style={s.p}>{m.decay.verdictLine}</Text>
                <BandBarsPlot g={m.decay.plot} />
                <Text style={s.caption}>Reverberation time (Eyring) per octave band before and after, with the target band shaded. Shapes give the verdict: circle within, triangle near, cross outside.</Text>
              </View>
            }
          >
            <Table t={m.decay.table} widths={[0.9, 1, 1, 1.1, 1, 1.2]} />
            {m.decay.notes.map((t, i) => (
              <Text key={i} style={s.small}>
                {t}
              </Text>
            ))}
          </Chapter>
        ) : null}

        <Chapter n={next()} title="Treatment plan" newPage>
          {m.treatment.empty ? (
            <Text style={s.p}>The recommended scenario adds no treatment.</Text>
          ) : (
            <>
              <Table t={m.treatment.items} widths={[0.4, 1.8, 1.3, 0.6, 3]} />
              {m.treatment.builds.map((b) => (
                <View key={b.index} style={{ marginBottom: 6 }}>
                  <View wrap={false}>
                    <Text style={s.h3}>{b.title}</Text>
                    <Text style={[s.small, { marginBottom: 3 }]}>{b.description}</Text>
                    {b.rating ? (
                      <Text style={{ marginBottom: 3 }}>
                        {`αw ${b.rating.alphaW}${b.rating.indicators ? ` (${b.rating.indicators})` : ""}, class ${b.rating.absorptionClass} (ISO 11654) · NRC ${b.rating.nrc}, SAA ${b.rating.saa} (ASTM C423, from the modelled α)`}
                      </Text>
                    ) : (
                      <Text style={[s.small, { marginBottom: 3 }]}>Rated as an object: absorption area per band (single-number α ratings apply to flat panels only).</Text>
                    )}
                    {b.alphaPlot ? <ResponsePlot g={b.alphaPlot} /> : null}
                  </View>
                  {b.absorption.rows.length > 0 ? <Table t={b.absorption} widths={[1.4, ...b.absorption.columns.slice(1).map(() => 1)]} /> : null}
                  {b.limits.map((t, i) => (
                    <Text key={i} style={s.small}>
                      {t}
                    </Text>
                  ))}
                </View>
              ))}
            </>
          )}
        </Chapter>

        <Chapter n={next()} title="Materials and cost" keepTogether>
          <Table t={m.costs.table} widths={[0.4, 1.8, 1.6, 0.6, 0.9, 0.8, 1]} />
          <Text style={s.small}>{m.costs.currencyNote}</Text>
        </Chapter>

        <Chapter n={next()} title="Cautions" newPage>
          {m.cautions.general.map((c, i) => (
            <View key={i} style={s.cautionBox} wrap={false}>
              <Text style={{ fontWeight: 600, marginBottom: 1 }}>{c.title}</Text>
              <Text style={{ fontSize: 9.2, lineHeight: 1.42 }}>{c.text}</Text>
            </View>
          ))}
          {m.cautions.specific.length > 0 ? (
            <>
              <H2>For the items of this plan</H2>
              <Bullets items={m.cautions.specific} />
            </>
          ) : null}
          <H2>Disclaimer</H2>
          <Text style={s.p}>{m.disclaimer}</Text>
        </Chapter>

        <Chapter n={next()} title="Methods and their limits" lead={<Method x={m.methods[0]!} />}>
          {m.methods.slice(1).map((x, i) => (
            <Method key={i} x={x} />
          ))}
          <Text style={s.small}>{`Calculation engine ${m.engineVersion}.`}</Text>
        </Chapter>

        <View wrap={false} style={{ marginTop: 18 }}>
          <View style={{ height: 1.2, backgroundColor: C.ink, marginBottom: 10 }} />
          <Text style={[s.h2, { marginTop: 0 }]}>Signature</Text>
          {m.signature ? (
            <>
              <KeyValues
                rows={[
                  ["Signed by", m.signature.signerName],
                  ["Date", m.signature.dateLabel],
                  ["Certificate", m.signature.subject],
                  ["SHA-256 fingerprint", m.signature.fingerprint.length > 48 ? `${m.signature.fingerprint.slice(0, 48)}\n${m.signature.fingerprint.slice(48)}` : m.signature.fingerprint],
                ]}
                keyWidth="26%"
              />
              <Text style={s.small}>{m.signature.statement}</Text>
            </>
          ) : (
            <Text style={s.p}>Not signed: this is a draft for review. The issued revision carries a digital signature.</Text>
          )}
        </View>
        </View>
      </Page>
    </Document>
  );
}
