// Where the summary property test's steps fall in time (reading-summary-ops.ts): anywhere in four
// years, near America/Chicago's daylight-saving changes (since 2007 at 2:00 local time on the
// second Sunday of March and the first Sunday of November: Energy Policy Act of 2005, §110; the
// IANA tz database's "US" rules), in the repeated hour of a fall-back, on a reading's local day
// or instant.
import fc from 'fast-check';

export const DST_CHANGES_UTC = [
  Date.UTC(2023, 2, 12, 8), // spring forward: 02:00 CST becomes 03:00 CDT
  Date.UTC(2023, 10, 5, 7), // fall back: 02:00 CDT becomes 01:00 CST
  Date.UTC(2024, 2, 10, 8),
  Date.UTC(2024, 10, 3, 7),
  Date.UTC(2025, 2, 9, 8),
  Date.UTC(2025, 10, 2, 7),
];

/** Where a step's time falls: anywhere, near a clock change, the same local day as a reading… */
export const timeChoice = fc.oneof(
  fc.record({
    near: fc.constant('anywhere' as const),
    at: fc.double({ min: 0, max: 1, noNaN: true }),
  }),
  fc.record({
    near: fc.constant('dst' as const),
    change: fc.nat(DST_CHANGES_UTC.length - 1),
    minutes: fc.integer({ min: -150, max: 150 }),
  }),
  // the repeated hour: the same local time in CDT and an hour later in CST
  fc.record({
    near: fc.constant('repeated hour' as const),
    change: fc.constantFrom(1, 3, 5),
    minute: fc.nat(59),
    second: fc.boolean(),
  }),
  fc.record({
    near: fc.constant('same day' as const),
    pick: fc.double({ min: 0, max: 1, noNaN: true }),
    minutes: fc.integer({ min: -600, max: 600 }),
  }),
  fc.record({ near: fc.constant('after last' as const), hours: fc.integer({ min: 1, max: 400 }) }),
  // a reading's very instant (a second reading then differs by at most the clock-skew allowance)
  fc.record({
    near: fc.constant('same instant' as const),
    pick: fc.double({ min: 0, max: 1, noNaN: true }),
  }),
  // a reading in the repeated hour's twin: the same local time an hour earlier or later
  fc.record({
    near: fc.constant('twin' as const),
    pick: fc.double({ min: 0, max: 1, noNaN: true }),
    later: fc.boolean(),
  }),
);
export type TimeChoice = typeof timeChoice extends fc.Arbitrary<infer T> ? T : never;
