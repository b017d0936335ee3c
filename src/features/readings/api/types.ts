// The JSON of the log-hours and import endpoints, typed by the zod schemas the server checks
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
} from '../../../../shared/schemas/readings';
