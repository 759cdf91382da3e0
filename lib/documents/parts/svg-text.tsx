import { Text } from "@react-pdf/renderer";
import { FIGURES, SANS } from "../fonts";
import { COLOURS } from "../theme";

type Props = {
  x: number;
  y: number;
  children: string;
  size?: number;
  figures?: boolean;
  weight?: 400 | 500 | 600;
  fill?: string;
  anchor?: "start" | "middle" | "end";
  /** degrees, about (x, y) */
  rotate?: number;
};

/**
 * Text inside an Svg figure. @react-pdf reads the font of SVG text from fontFamily, fontSize
 * and fontWeight props, which its type declarations leave out; this one place passes them.
 */
export function SvgText({ x, y, children, size = 6.5, figures = false, weight, fill = COLOURS.inkSoft, anchor = "start", rotate }: Props) {
  const props = {
    x,
    y,
    fill,
    textAnchor: anchor,
    fontFamily: figures ? FIGURES : SANS,
    fontSize: size,
    fontWeight: weight,
    transform: rotate ? `rotate(${rotate} ${x} ${y})` : undefined,
  };
  return <Text {...(props as { x: number; y: number })}>{children}</Text>;
}
