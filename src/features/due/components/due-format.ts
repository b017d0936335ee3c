// The due list's own words for how a due point is based and which limit governs; the figures
// themselves read as src/lib/due-format.ts words them, the same as on the dealer board.

export const GOVERNS_TEXT = {
  meter: 'Meter governs',
  calendar: 'Date governs',
} as const;

export const BASIS_TEXT = {
  recorded: null,
  first_service: 'First service (break-in)',
  assumed: 'Last service not recorded',
  counted: 'Counted from a start set in place of an unknown last service',
  unknown: 'History unknown — set last done on the machine page',
} as const;
