// The JSON of the reading endpoints (a machine's history, Log hours, import), typed by the zod schemas the server checks
// its answers against (shared/schemas/readings.ts).
export type {
  BulkReadingOutcome,
  BulkReadingsResponse,
  ImportPreview,
  ImportPreviewResponse,
  ImportPreviewRow,
  ImportResult,
  ImportResultResponse,
  LatestReading,
  LatestReadings,
  MeterReplacement,
  MeterReplacementResponse,
  Reading,
  ReadingHistory,
  ReadingLogged,
  ReadingResponse,
} from '../../../../shared/schemas/readings';
