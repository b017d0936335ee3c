// Lines of a Linux SocketCAN `candump` log (can-utils), read into frames. Two forms:
//   (1764662400.123456) can0 18FEE500#7260000000000000      candump -l (log file)
//   (1764662400.123456)  can0  18FEE500   [8]  72 60 00 00 00 00 00 00   candump -ta (screen)
//   can0  18FEE500   [8]  72 60 00 00 00 00 00 00            candump (screen, no time)
// Times are seconds since 1970 (UTC). An 8-hex-digit identifier is a 29-bit (extended) one;
// three digits are an 11-bit one, which J1939 does not use.

export interface CanFrame {
  /** milliseconds since 1970, or null when the line carried no time */
  timeMs: number | null;
  iface: string;
  canId: number;
  /** true for a 29-bit identifier */
  extended: boolean;
  data: number[];
}

const TIME = String.raw`(?:\((\d{1,12})(?:\.(\d{1,9}))?\)\s+)?`;
const IFACE = String.raw`([A-Za-z][\w.-]{0,15})`;
const LOG_FORM = new RegExp(
  String.raw`^${TIME}${IFACE}\s+([0-9A-Fa-f]{3}|[0-9A-Fa-f]{8})#([0-9A-Fa-f]{0,16})$`,
);
const SCREEN_FORM = new RegExp(
  String.raw`^${TIME}${IFACE}\s+([0-9A-Fa-f]{3}|[0-9A-Fa-f]{8})\s+\[(\d)\]((?:\s+[0-9A-Fa-f]{2}){0,8})$`,
);

const timeOf = (seconds?: string, fraction?: string) =>
  seconds === undefined
    ? null
    : Number(seconds) * 1000 + Math.floor(Number(`0.${fraction ?? '0'}`) * 1000);

/**
 * One candump line as a frame; null when the line is in neither form (or its byte count does not
 * match its [n]). Surrounding spaces are ignored.
 */
export function parseCandumpLine(line: string): CanFrame | null {
  const text = line.trim();
  const log = LOG_FORM.exec(text);
  if (log) {
    const [, seconds, fraction, iface, id, hex] = log;
    if (hex.length % 2) return null;
    const data = hex.match(/../g)?.map((b) => parseInt(b, 16)) ?? [];
    return frame(timeOf(seconds, fraction), iface, id, data);
  }
  const screen = SCREEN_FORM.exec(text);
  if (screen) {
    const [, seconds, fraction, iface, id, count, bytes] = screen;
    const data = bytes.trim()
      ? bytes
          .trim()
          .split(/\s+/)
          .map((b) => parseInt(b, 16))
      : [];
    if (data.length !== Number(count)) return null;
    return frame(timeOf(seconds, fraction), iface, id, data);
  }
  return null;
}

const frame = (timeMs: number | null, iface: string, id: string, data: number[]): CanFrame => ({
  timeMs,
  iface,
  canId: parseInt(id, 16),
  extended: id.length === 8,
  data,
});

/**
 * Of readings in any order, the last of each clock hour (UTC hours: whole hours are the same
 * everywhere but in a few half-hour zones, and an hourly history is what matters here), in time
 * order. Ties in time keep the later one in the input.
 */
export function lastOfEachHour<T extends { timeMs: number }>(items: readonly T[]): T[] {
  const byHour = new Map<number, T>();
  for (const item of items) {
    const hour = Math.floor(item.timeMs / 3_600_000);
    const kept = byHour.get(hour);
    if (!kept || item.timeMs >= kept.timeMs) byHour.set(hour, item);
  }
  return [...byHour.values()].sort((a, b) => a.timeMs - b.timeMs);
}
