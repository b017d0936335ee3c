// Reading a season profile (a UsageEstimate's daily use, index 0 = the day after its anchor) day
// by day: the profile repeats with a year's period past its end, as it is built.

/** Use on profile day i (i ≥ 0), the profile repeating yearly past its end; null before it. */
export function profileDay(profile: readonly number[], i: number): number | null {
  if (i < 0) return null;
  return profile[i < profile.length ? i : i % 365] ?? null;
}

/** The profile's average working day (over its days with any use), 0 when it never works. */
export function averageWorkingDay(profile: readonly number[]): number {
  let sum = 0;
  let days = 0;
  for (const u of profile)
    if (u > 0) {
      sum += u;
      days += 1;
    }
  return days ? sum / days : 0;
}
