// Colours of the meter chart from the palette (tailwind.config.ts); each series also differs by
// line style, and the legend names them, so colour is never the only difference.
export const INK = '#2b3a31'; // field-800
export const TREND = '#92633d'; // loam-500
export const BAND = '#f4da8a'; // straw-200
export const DUE = '#a92c1c'; // poppy-600
export const REPLACED = '#235f8e'; // sky-600
export const SERVICE = '#235f8e'; // sky-600, drawn as a square
