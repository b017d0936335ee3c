// SAE J1939 engine hours from CAN frames (issue 13), after SAE J1939-71 as ../shared/CHECKS.md
// gives it: PGN 65253 (0xFEE5) "Engine Hours, Revolutions" carries SPN 247 Engine Total Hours of
// Operation in data bytes 1–4, little-endian, 0.05 h per bit, offset 0; raw values above
// 0xFAFFFFFF mean error or not available (the upper ranges J1939-71 reserves for a 4-byte
// parameter). The PGN of a 29-bit identifier is read as SAE J1939-21 defines it.

/** PGN 65253: Engine Hours, Revolutions (HOURS). */
export const PGN_ENGINE_HOURS = 0xfee5;
/** SPN 247 resolution: hours per bit. */
export const SPN_247_HOURS_PER_BIT = 0.05;
/** The largest raw SPN 247 value that is a measurement (above: error or not available). */
export const SPN_247_MAX_VALID_RAW = 0xfaffffff;

/**
 * The PGN of a 29-bit CAN identifier (priority 3 bits, then EDP/DP, PDU format, PDU specific,
 * source address). PF ≥ 240 (PDU2, broadcast): PGN = DP<<16 | PF<<8 | PS; PF < 240 (PDU1): PS is a
 * destination address and counts as 0.
 */
export function pgnOf(canId: number): number {
  const dataPage = (canId >>> 24) & 0x3; // EDP and DP
  const pduFormat = (canId >>> 16) & 0xff;
  const pduSpecific = (canId >>> 8) & 0xff;
  return (dataPage << 16) | (pduFormat << 8) | (pduFormat >= 240 ? pduSpecific : 0);
}

/** The source address (last byte) of a 29-bit identifier. */
export const sourceAddressOf = (canId: number) => canId & 0xff;

export type EngineHours =
  { ok: true; raw: number; hours: number } | { ok: false; raw: number | null; reason: string };

/**
 * SPN 247 from the data bytes of a PGN 65253 frame: hours (0.05 h per bit, rounded to the
 * hundredth a reading keeps), or why there is none (frame too short, error or not available).
 */
export function engineHoursOf(data: readonly number[]): EngineHours {
  if (data.length < 4)
    return { ok: false, raw: null, reason: 'Frame too short: SPN 247 needs data bytes 1–4' };
  // >>> 0 keeps the 32-bit value unsigned
  const raw = (data[0] | (data[1] << 8) | (data[2] << 16) | (data[3] << 24)) >>> 0;
  if (raw > SPN_247_MAX_VALID_RAW) {
    const hex = raw.toString(16).toUpperCase().padStart(8, '0');
    return {
      ok: false,
      raw,
      reason: `Engine hours not available or in error (raw 0x${hex} is above 0xFAFFFFFF)`,
    };
  }
  // raw × 0.05 as raw / 20, so 24,690 gives exactly 1,234.5 (no binary fraction of 0.05)
  return { ok: true, raw, hours: Math.round((raw / 20) * 100) / 100 };
}

/** The four data bytes (little-endian) of an SPN 247 value in hours: the encoder for tests. */
export function engineHoursBytes(hours: number): number[] {
  const raw = Math.round(hours / SPN_247_HOURS_PER_BIT);
  return [raw & 0xff, (raw >>> 8) & 0xff, (raw >>> 16) & 0xff, (raw >>> 24) & 0xff];
}
