import type { ReactNode } from "react";
import { Text, View } from "@react-pdf/renderer";
import { FIGURES } from "../fonts";
import { COLOURS } from "../theme";

export interface Column<T> {
  header: string;
  /** relative width */
  width: number;
  /** numbers are right-aligned in tabular figures */
  numeric?: boolean;
  cell: (row: T) => ReactNode;
}

/**
 * A dense table of the drawing-sheet kind: a ruled header repeated on every page the table runs
 * onto, thin rules between rows, numbers right-aligned in tabular figures. `tone` paints a row's
 * background (amber or red only for flags).
 */
export function Table<T>(props: { columns: Column<T>[]; rows: readonly T[]; tone?: (row: T) => string | undefined; fontSize?: number; rowHeight?: number }) {
  const { columns, rows, tone, fontSize = 7.5, rowHeight } = props;
  const cellStyle = (c: Column<T>) => ({ flex: c.width, paddingHorizontal: 3, paddingVertical: 2.5, textAlign: c.numeric ? ("right" as const) : ("left" as const) });
  return (
    <View style={{ fontSize, marginBottom: 8 }}>
      <View fixed style={{ flexDirection: "row", borderBottomWidth: 0.9, borderBottomColor: COLOURS.ink, borderTopWidth: 0.5, borderTopColor: COLOURS.rule, backgroundColor: COLOURS.paperDeep }}>
        {columns.map((c) => (
          <Text key={c.header} style={{ ...cellStyle(c), fontWeight: 600, fontSize: fontSize - 0.5, color: COLOURS.inkSoft }}>
            {c.header}
          </Text>
        ))}
      </View>
      {rows.map((row, i) => (
        <View key={i} wrap={false} style={{ flexDirection: "row", borderBottomWidth: 0.4, borderBottomColor: COLOURS.rule, backgroundColor: tone?.(row), ...(rowHeight ? { height: rowHeight } : {}) }}>
          {columns.map((c) => (
            <Text key={c.header} style={{ ...cellStyle(c), ...(c.numeric ? { fontFamily: FIGURES } : {}) }}>
              {c.cell(row)}
            </Text>
          ))}
        </View>
      ))}
    </View>
  );
}

/** Rows split into runs of `size`, for tables paginated by hand (react-pdf's own page splitting grows fast with the rows). */
export function chunks<T>(rows: readonly T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < rows.length; i += size) out.push(rows.slice(i, i + size));
  return out.length ? out : [[]];
}

/** Label and value pairs in two columns, for covers and title blocks. */
export function Facts({ items, labelWidth = 90 }: { items: [label: string, value: ReactNode][]; labelWidth?: number }) {
  return (
    <View style={{ marginBottom: 6 }}>
      {items.map(([label, value], i) => (
        <View key={i} style={{ flexDirection: "row", marginBottom: 2.5 }}>
          <Text style={{ width: labelWidth, fontSize: 7, fontWeight: 600, color: COLOURS.inkSoft, textTransform: "uppercase", letterSpacing: 0.5, paddingTop: 1 }}>{label}</Text>
          <Text style={{ flex: 1 }}>{value}</Text>
        </View>
      ))}
    </View>
  );
}

/** A boxed note: "caution" (amber) for cautions and flags, "fault" (red) for failures, "plain" otherwise. */
export function Notice({ title, tone = "plain", children }: { title: string; tone?: "plain" | "caution" | "fault"; children: ReactNode }) {
  const colours = {
    plain: { edge: COLOURS.ink, ground: COLOURS.paperDeep },
    caution: { edge: COLOURS.caution, ground: COLOURS.cautionSoft },
    fault: { edge: COLOURS.fault, ground: COLOURS.faultSoft },
  }[tone];
  return (
    <View wrap={false} style={{ borderLeftWidth: 2.5, borderLeftColor: colours.edge, backgroundColor: colours.ground, padding: 7, marginBottom: 8 }}>
      <Text style={{ fontWeight: 600, marginBottom: 2 }}>{title}</Text>
      <View style={{ fontSize: 8 }}>{children}</View>
    </View>
  );
}
