// Colours of the meter chart from the palette (tailwind.config.ts); each series also differs by
// line style, and the legend names them, so colour is never the only difference.
export const INK = '#2b3a31'; // field-800
export const TREND = '#92633d'; // loam-500
export const BAND = '#f4da8a'; // straw-200
export const DUE = '#a92c1c'; // poppy-600
/**
 * One colour per due line, in order up the chart: dark enough for their labels to read on white
 * (at least 4.5 : 1) and apart from the readings' ink, the trend's brown and the replacements' blue.
 */
export const DUE_LINE_COLOURS = [
  DUE,
  '#6a3d9a', // violet
  '#0b6e69', // teal
  '#9a4a00', // rust
  '#a2185b', // berry
  '#4d5d12', // olive
] as const;
export const REPLACED = '#235f8e'; // sky-600
export const SERVICE = '#235f8e'; // sky-600, drawn as a square
