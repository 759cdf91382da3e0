import { Text, View } from "@react-pdf/renderer";
import type { SnapshotSurface, SubmittalSnapshot } from "@/lib/submittals";
import { Paragraph, SectionTitle } from "../parts/frame";
import { Facts, Table } from "../parts/table";
import { styles } from "../theme";
import { type DocContext, surfaceName } from "./context";

type Material = SubmittalSnapshot["materials"][number];
const OCTAVES = ["125", "250", "500", "1000", "2000", "4000"];

export function Assumptions(c: DocContext) {
  const { s, f } = c;
  const r = s.room;
  const size = r.length !== null && r.width !== null && r.height !== null ? `${f.len(r.length)} × ${f.len(r.width)} × ${f.len(r.height)}, ` : "";
  return (
    <View>
      <SectionTitle kicker="5  Assumptions" title="Assumptions and model limits" />
      <Facts
        labelWidth={110}
        items={[
          ["Room", `${size}${f.volume(r.volume)} (${r.shape === "shoebox" ? "a rectangular room" : "volume and surfaces entered by hand"})`],
          ["Air", `${r.air.temperature} °C, ${r.air.humidity} % relative humidity, ${(r.air.pressure / 1000).toFixed(3)} kPa; air absorption after ISO 9613-1`],
          ["Sound field", "diffuse: Sabine's and Eyring's formulas; each treated area replaces the finish it covers, every panel counted at its full size"],
          ["Panels", "absorption predicted per build-up by the transfer-matrix model, field incidence; octave values are the means of their one-third octaves"],
          ["Edge clearance", `${f.panel(s.project.edgeClearance)} from surface edges and openings (the project's board rule)`],
        ]}
      />
      <Text style={styles.h3}>Surfaces</Text>
      <Table
        columns={[
          { header: "Surface", width: 1.6, cell: (x: SnapshotSurface) => x.name },
          { header: "Size", width: 1.5, numeric: true, cell: (x) => f.size(x.width, x.height) },
          { header: "Net area", width: 0.9, numeric: true, cell: (x) => f.area(x.netArea) },
          { header: "Finish", width: 2, cell: (x) => x.finish.name },
          { header: "Openings", width: 2.2, cell: (x) => (x.openings.length ? x.openings.map((o) => `${o.name || o.kind} ${f.size(o.width, o.height)}`).join("; ") : "none") },
        ]}
        rows={s.surfaces}
      />
      <Text style={styles.h3}>Finishes and openings: absorption coefficients used</Text>
      <Table
        fontSize={6.8}
        columns={[
          { header: "Material", width: 2, cell: (m: Material) => m.name },
          ...OCTAVES.map((o) => ({ header: `${Number(o) >= 1000 ? `${Number(o) / 1000}k` : o}`, width: 0.45, numeric: true, cell: (m: Material) => (m.alpha[o] === undefined ? "–" : m.alpha[o].toFixed(2)) })),
          { header: "Source", width: 3.2, cell: (m: Material) => m.source || "not given" },
        ]}
        rows={s.materials}
      />
      <Text style={styles.h3}>Limits of the predictions</Text>
      {s.engine.limits.map((l) => (
        <Paragraph key={l}>{`–  ${l.charAt(0).toUpperCase()}${l.slice(1)}.`}</Paragraph>
      ))}
      <Paragraph>–  The reverberation formulas assume a diffuse sound field; rooms with very uneven absorption or proportions behave otherwise. Confirm performance spaces and rooms with legal limits by measurement in the finished room.</Paragraph>
      {s.warnings.length > 0 && (
        <View>
          <Text style={styles.h3}>Warnings about the room&apos;s input</Text>
          {s.warnings.map((w) => (
            <Paragraph key={w.field + w.message}>{`${w.field}: ${w.message}`}</Paragraph>
          ))}
        </View>
      )}
      <Text style={styles.h3}>Review pins still open at issue</Text>
      {s.pins.length ? (
        s.pins.map((p) => <Paragraph key={`${p.surfaceKey}-${p.number}`}>{`Pin ${p.number} on ${surfaceName(s, p.surfaceKey)} at ${f.panel(p.x)}, ${f.panel(p.y)} from the datum${p.author ? ` (${p.author})` : ""}: ${p.body}`}</Paragraph>)
      ) : (
        <Paragraph>None.</Paragraph>
      )}
    </View>
  );
}
