// Readings straight from the machine (issue 13): the two bodies a telematics feed posts with an
// organization API key, and the per-item answers.
//
// ISO/TS 15143-3 ("mixed-fleet" telematics, the AEMP 2.0 data set), JSON form. We rely on these
// fields only: Fleet → Equipment[] → EquipmentHeader (SerialNumber, PIN, EquipmentID; OEMName and
// Model are echoed back) and CumulativeOperatingHours (datetime: ISO 8601 with offset, Hour:
// decimal hours). The names are those of ../shared/CHECKS.md and of public sample snapshots; the
// standard's own text was not read, so the shapes here are from memory of those samples. Other
// members (Links, Location, FuelUsed…) are allowed and ignored. Hour is taken as a JSON number;
// a feed that turns XML into JSON with strings for numbers is refused by name.
import { z } from 'zod';
import { PAST_DATES, boundedNumber, isoDateTime, plainText } from './common';
import { METER_BOUNDS } from './readings';

/** At most this many Equipment entries in one snapshot (a page of a larger fleet). */
export const SNAPSHOT_MAX_EQUIPMENT = 2000;

const idText = plainText(80);

const equipmentHeaderSchema = z
  .looseObject({
    OEMName: plainText(120).optional(),
    Model: plainText(120).optional(),
    EquipmentID: idText.optional(),
    SerialNumber: idText.optional(),
    PIN: idText.optional(),
  })
  .refine((h) => Boolean(h.SerialNumber || h.PIN || h.EquipmentID), {
    error: 'Give the SerialNumber, PIN or EquipmentID of the machine',
  });

const operatingHoursSchema = z.looseObject({
  datetime: isoDateTime('datetime', PAST_DATES),
  Hour: boundedNumber('Hour', METER_BOUNDS),
});

const equipmentSchema = z.looseObject({
  EquipmentHeader: equipmentHeaderSchema,
  CumulativeOperatingHours: operatingHoursSchema.optional(),
});

export const isoSnapshotSchema = z.object({
  Fleet: z.looseObject({
    version: z.union([z.string().max(40), z.number()]).optional(),
    snapshotTime: z.string().max(40).optional(),
    Equipment: z
      .array(equipmentSchema, { error: 'Equipment must be a list' })
      .min(1, { error: 'The snapshot has no Equipment' })
      .max(SNAPSHOT_MAX_EQUIPMENT, {
        error: `At most ${SNAPSHOT_MAX_EQUIPMENT.toLocaleString('en-US')} Equipment entries per post; send the rest in the next`,
      }),
  }),
});
export type IsoSnapshot = z.infer<typeof isoSnapshotSchema>;

/** A machine named in the path: its id (uuid) or the telematics id mapped to it. */
export const telematicsMachineParams = z.object({
  machine: plainText(80, { required: 'Name the machine: its id or telematics id' }),
});

/** A candump log, as text: at most 20 MB. */
export const CANDUMP_MAX_BYTES = 20 * 1024 * 1024;
export const candumpBodySchema = z
  .string({ error: 'Send the candump log as text (Content-Type: text/plain)' })
  .min(1, { error: 'The log is empty' })
  .meta({
    description:
      'candump lines: `(1764660000.000000) can0 18FEE500#7260000000000000` (candump -l) or `can0  18FEE500   [8]  72 60 00 00 00 00 00 00`',
  });

// ── Responses ────────────────────────────────────────────────────────────────────────────────

export const TELEMATICS_ITEM_STATUSES = [
  'recorded',
  'already_there',
  'refused',
  'unknown_equipment',
  'no_hours',
] as const;
export type TelematicsItemStatus = (typeof TELEMATICS_ITEM_STATUSES)[number];

export const telematicsCountsSchema = z.object({
  recorded: z.number(),
  alreadyThere: z.number(),
  refused: z.number(),
  unknownEquipment: z.number(),
  noHours: z.number(),
});

/** What became of one Equipment entry: matched or not, and its reading recorded or why not. */
export const snapshotItemSchema = z.object({
  /** place in Fleet.Equipment */
  index: z.number(),
  serialNumber: z.string().nullable(),
  pin: z.string().nullable(),
  equipmentId: z.string().nullable(),
  machineId: z.string().nullable(),
  fleetNumber: z.string().nullable(),
  status: z.enum(TELEMATICS_ITEM_STATUSES),
  /** the rule a refused reading broke, or why nothing was matched */
  reason: z.string().nullable(),
});
export type SnapshotItem = z.infer<typeof snapshotItemSchema>;

export const snapshotResponseSchema = z.object({
  data: z.object({ items: z.array(snapshotItemSchema), counts: telematicsCountsSchema }),
});
export type SnapshotResult = z.infer<typeof snapshotResponseSchema>['data'];

export const candumpResponseSchema = z.object({
  data: z.object({
    machineId: z.string(),
    fleetNumber: z.string(),
    /** lines read (blank lines not counted) */
    lines: z.number(),
    /** PGN 65253 frames with engine hours */
    engineHourFrames: z.number(),
    /** frames of other PGNs (or 11-bit ids), skipped */
    otherFrames: z.number(),
    /** readings offered after keeping the last frame of each clock hour */
    kept: z.number(),
    recorded: z.number(),
    alreadyThere: z.number(),
    /** frames refused: not available / error values, and readings a rule refused */
    refused: z.array(z.object({ line: z.number(), reason: z.string() })),
  }),
});
export type CandumpResult = z.infer<typeof candumpResponseSchema>['data'];
