import { Line, Rect, Svg, Text, View } from "@react-pdf/renderer";
import { FIGURES } from "../fonts";
import { chunks } from "../parts/table";
import { type PlacementRow, placementRows } from "../quantities";
import { COLOURS, styles } from "../theme";
import { DRAWING_AREA, type ShopContext } from "./context";
import { DrawingSheet } from "./sheet";

const ROW_HEIGHT = 12;
const FONT_SIZE = 7.2;
/** Rows of one column on a sheet: the drawing area less the heading and the column header. */
const ROWS_PER_COLUMN = Math.floor((DRAWING_AREA.height - 64 - 18) / ROW_HEIGHT);

/** Character widths of the columns; text left-aligned, lengths right-aligned, in Plex Mono. */
const COLUMNS = [
  { header: "Code", chars: 8 },
  { header: "Surface", chars: 20 },
  { header: "Type", chars: 6 },
  { header: "Set-out x", chars: 11, right: true },
  { header: "Set-out y", chars: 11, right: true },
  { header: "Width", chars: 10, right: true },
  { header: "Height", chars: 10, right: true },
];

function line(values: string[]): string {
  return COLUMNS.map((c, i) => {
    const v = values[i].length > c.chars - 1 ? `${values[i].slice(0, c.chars - 2)}…` : values[i];
    return c.right ? v.padStart(c.chars) : v.padEnd(c.chars);
  }).join("");
}

/**
 * One column of the schedule: its rows are the lines of one monospace text, over a drawing of
 * the row rules and tick boxes. A 500-panel schedule is then a dozen text runs to lay out
 * instead of thousands of cells (the renderer's cost is per run), and the columns still line up.
 */
function ScheduleColumn({ c, rows }: { c: ShopContext; rows: PlacementRow[] }) {
  const { f } = c;
  const width = (DRAWING_AREA.width - 18) / 2;
  const body = rows.length * ROW_HEIGHT;
  const box = width - 30;
  return (
    <View style={{ width }}>
      <View style={{ flexDirection: "row", height: ROW_HEIGHT + 4, alignItems: "center", backgroundColor: COLOURS.paperDeep, borderTopWidth: 0.5, borderTopColor: COLOURS.rule, borderBottomWidth: 0.9, borderBottomColor: COLOURS.ink }}>
        <Text style={{ fontFamily: FIGURES, fontSize: FONT_SIZE, fontWeight: 500, color: COLOURS.inkSoft, paddingLeft: 3, width: box }}>{line(COLUMNS.map((col) => col.header))}</Text>
        <Text style={{ fontSize: FONT_SIZE, fontWeight: 600, color: COLOURS.inkSoft }}>Fixed</Text>
      </View>
      <View style={{ minHeight: body }}>
        <Svg width={width} height={body} viewBox={`0 0 ${width} ${body}`} style={{ position: "absolute", top: 0, left: 0 }}>
          {rows.map((r, i) => (
            <Line key={`l${i}`} x1={0} x2={width} y1={(i + 1) * ROW_HEIGHT} y2={(i + 1) * ROW_HEIGHT} stroke={COLOURS.rule} strokeWidth={0.4} />
          ))}
          {rows.map((r, i) => (
            <Rect key={`b${i}`} x={box + 6} y={i * ROW_HEIGHT + 2.5} width={7} height={7} fill="none" stroke={COLOURS.inkSoft} strokeWidth={0.6} />
          ))}
        </Svg>
        <Text style={{ fontFamily: FIGURES, fontSize: FONT_SIZE, lineHeight: ROW_HEIGHT / FONT_SIZE, paddingLeft: 3 }}>
          {rows.map((r) => line([r.code, r.surface, r.type, f.panel(r.x), f.panel(r.y), f.panel(r.width), f.panel(r.height)])).join("\n")}
        </Text>
      </View>
    </View>
  );
}

/** The placement schedule, two columns a sheet, paginated here rather than by the renderer. */
export function PlacementScheduleSheets({ c }: { c: ShopContext }) {
  const sheets = chunks(chunks(placementRows(c.s), ROWS_PER_COLUMN), 2);
  return (
    <>
      {sheets.map((columns, i) => (
        <DrawingSheet key={i} c={c} title={sheets.length > 1 ? `Placement schedule (${i + 1} of ${sheets.length})` : "Placement schedule"}>
          <Text style={styles.kicker}>Set-out</Text>
          <Text style={styles.h2}>Placement schedule</Text>
          <Text style={{ ...styles.small, marginBottom: 6 }}>Set-out is the panel&apos;s lower-left corner, measured from the lower-left corner of its surface, seen from inside the room. Tick each panel as it is fixed.</Text>
          <View style={{ flexDirection: "row" }}>
            <ScheduleColumn c={c} rows={columns[0]} />
            <View style={{ width: 18 }} />
            {columns[1] ? <ScheduleColumn c={c} rows={columns[1]} /> : null}
          </View>
        </DrawingSheet>
      ))}
    </>
  );
}
