// The board's drawing colours: the app's palette (tailwind.config.ts), as Konva needs them.
export const INK = "#1a2740";
export const INK_SOFT = "#44506a";
export const COPPER = "#b0602f";
export const COPPER_DEEP = "#8a4520";
export const FAULT = "#a8281f";
export const CAUTION = "#c98a12";
export const PAPER = "#fffdf8";
export const OPENING_FILL = "#ece5d6";
export const PIN_RESOLVED = "#566075";
export const SAGE = "#4f6f52";
export const SAGE_SOFT = "#d9e4d6";
