// A SAE J1939 candump log for one machine, posted with an API key (issue 13): PGN 65253 frames
// decoded to engine hours (shared/domain/j1939.ts), the last frame of each clock hour kept so a
// long log does not flood the history, each written through the reading rules. Frames of other
// PGNs are counted and skipped; error / not-available values are refused line by line; a line
// in neither candump form refuses the whole log (400 naming the line), nothing written.
import { sequelize } from '../db';
import { AppError, notFound } from '../errors';
import type { KeyContext } from '../policies/context';
import { lastOfEachHour, parseCandumpLine } from '../../shared/domain/candump';
import { PGN_ENGINE_HOURS, engineHoursOf, pgnOf } from '../../shared/domain/j1939';
import type { CandumpResult } from '../../shared/schemas/telematics';
import { hoursRefusal } from './telematics';
import { lockMachineNamed } from './telematics-match';
import { recordTelematicsReadings } from './telematics-write';

// Frame times a reading may carry: not before 1990, nor more than five minutes ahead of the
// server (a logger's clock a little fast).
const EARLIEST_MS = Date.UTC(1990, 0, 1);
const AHEAD_MS = 5 * 60_000;

interface HourFrame {
  line: number;
  timeMs: number;
  hours: number;
}

/** The log read into engine-hour frames, refusals and counts; a line that is no frame is a 400. */
export function readCandump(text: string, receivedAtMs: number) {
  const frames: HourFrame[] = [];
  const refused: CandumpResult['refused'] = [];
  let lines = 0;
  let otherFrames = 0;
  const bad: Record<string, string> = {};
  for (const [i, raw] of text.split(/\r?\n/).entries()) {
    if (!raw.trim()) continue;
    lines++;
    const line = i + 1;
    const frame = parseCandumpLine(raw);
    if (!frame) {
      if (Object.keys(bad).length < 20)
        bad[`line ${line}`] =
          'Not a candump line: expected (seconds.micro) can0 18FEE500#<hex> or can0  18FEE500   [8]  72 60 …';
      continue;
    }
    if (!frame.extended || pgnOf(frame.canId) !== PGN_ENGINE_HOURS) {
      otherFrames++;
      continue;
    }
    const decoded = engineHoursOf(frame.data);
    const timeMs = frame.timeMs ?? receivedAtMs;
    if (!decoded.ok) refused.push({ line, reason: decoded.reason });
    else if (timeMs < EARLIEST_MS || timeMs > receivedAtMs + AHEAD_MS)
      refused.push({
        line,
        reason: `Frame time ${new Date(timeMs).toISOString()} is not a time a reading can have (1990 up to now)`,
      });
    else frames.push({ line, timeMs, hours: decoded.hours });
  }
  if (Object.keys(bad).length)
    throw new AppError(
      400,
      'invalid',
      Object.entries(bad)
        .map(([k, v]) => `${k}: ${v}`)
        .join('; '),
      bad,
    );
  return { frames, refused, lines, otherFrames };
}

/** Decodes and records a log for the machine named by id or telematics id (404 if not the key's). */
export async function ingestCandump(
  key: KeyContext,
  machineRef: string,
  text: string,
): Promise<CandumpResult> {
  const { frames, refused, lines, otherFrames } = readCandump(text, Date.now());
  const kept = lastOfEachHour(frames);
  // every PGN 65253 frame: those decoded and those refused before any rule was asked
  const engineHourFrames = frames.length + refused.length;
  return sequelize.transaction(async (transaction) => {
    const found = await lockMachineNamed(key.organization.id, machineRef, transaction);
    if (!found) throw notFound('Machine');
    const { machine, meter } = found;
    const refusal = hoursRefusal(machine, meter);
    if (refusal) throw new AppError(409, 'no_hour_meter', refusal);
    const outcomes = await recordTelematicsReadings(
      key,
      kept.map((f) => ({
        machine,
        meterId: meter!.id,
        value: f.hours,
        takenAt: new Date(f.timeMs),
      })),
      transaction,
    );
    let recorded = 0;
    let alreadyThere = 0;
    outcomes.forEach((o, i) => {
      if (o.status === 'refused') refused.push({ line: kept[i].line, reason: o.reason });
      else if (o.status === 'recorded') recorded++;
      else alreadyThere++;
    });
    return {
      machineId: machine.id,
      fleetNumber: machine.fleetNumber,
      lines,
      engineHourFrames,
      otherFrames,
      kept: kept.length,
      recorded,
      alreadyThere,
      refused: refused.sort((a, b) => a.line - b.line),
    };
  });
}
