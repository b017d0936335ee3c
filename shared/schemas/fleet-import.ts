import { z } from 'zod';

// The answers of the fleet import (a spreadsheet of machines saved as CSV), one shape for the
// server's responses and the client's types.

/** What importing a row does: a new machine, a change to one, nothing, or a refusal. */
export const FLEET_ROW_OUTCOMES = ['create', 'update', 'unchanged', 'error'] as const;
export type FleetRowOutcome = (typeof FLEET_ROW_OUTCOMES)[number];

export const fleetImportRowSchema = z.object({
  /** the file line the row starts on (the header is line 1) */
  line: z.number(),
  fleetNumber: z.string(),
  /** the machine's name after the import (null when the row names none and no machine exists) */
  name: z.string().nullable(),
  /** the existing machine's id; null for a new one */
  machineId: z.string().nullable(),
  outcome: z.enum(FLEET_ROW_OUTCOMES),
  /** what the row changes, in words ("model", "reading 4,210 h on 2026-05-01", …) */
  changes: z.array(z.string()),
  /** every problem of the row, each starting "Line N:" */
  errors: z.array(z.string()),
});
export type FleetImportRow = z.infer<typeof fleetImportRowSchema>;

export const fleetImportPreviewSchema = z.object({
  rows: z.array(fleetImportRowSchema),
  summary: z.object({
    total: z.number(),
    create: z.number(),
    update: z.number(),
    unchanged: z.number(),
    errors: z.number(),
  }),
  columns: z.object({
    /** machine columns recognised, as written in the header */
    machine: z.array(z.string()),
    /** the schedule tasks named by last-service columns */
    tasks: z.array(z.string()),
    /** header cells that are not import columns (left alone) */
    ignored: z.array(z.string()),
  }),
});
export type FleetImportPreview = z.infer<typeof fleetImportPreviewSchema>;
export const fleetImportPreviewResponseSchema = z.object({ data: fleetImportPreviewSchema });
export type FleetImportPreviewResponse = z.infer<typeof fleetImportPreviewResponseSchema>;

export const fleetImportResultSchema = z.object({
  created: z.number(),
  updated: z.number(),
  unchanged: z.number(),
  total: z.number(),
  /** tasks of the imported machines still waiting for their last service */
  historyUnknown: z.number(),
});
export type FleetImportResult = z.infer<typeof fleetImportResultSchema>;
export const fleetImportResultResponseSchema = z.object({ data: fleetImportResultSchema });
export type FleetImportResultResponse = z.infer<typeof fleetImportResultResponseSchema>;
