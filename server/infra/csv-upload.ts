// A CSV file uploaded as multipart form data, parsed as it arrives: the bytes go from the socket
// through busboy into csv-parse and each record is handed on at once, so a 50 MB file is never
// held in memory. Read the same way as every import (server/infra/csv-sheet.ts: header row, comma
// or semicolon, byte-order mark, CRLF). Refusals name the file and the limit: 413 past maxBytes,
// 422 past maxRows, 400 when no file came.
import { createHash } from 'node:crypto';
import type { Request } from 'express';
import busboy from 'busboy';
import { parse, type Parser } from 'csv-parse';
import { AppError, invalid } from '../errors';
import { detectDelimiter, normaliseHeader } from './csv-sheet';

export interface CsvUploadLimits {
  /** the multipart field that carries the file */
  field: string;
  maxBytes: number;
  /** data rows (the header not counted) */
  maxRows: number;
  /** one row in messages: "reading" */
  what: string;
}

export interface CsvHeader {
  delimiter: ',' | ';';
  /** header cells lower-cased, with runs of spaces made one */
  header: string[];
}

export interface CsvRowSink {
  /** called once, before any row; may throw to refuse the file (e.g. a missing column) */
  header(header: CsvHeader): void;
  /** called for each data row with the file line it starts on */
  row(record: string[], line: number): void;
}

export interface CsvUploadInfo {
  fileName: string;
  rows: number;
  bytes: number;
  /** SHA-256 of the file's bytes, hex */
  digest: string;
}

const mb = (bytes: number) => `${Math.round((bytes / 2 ** 20) * 10) / 10} MB`;
const upload400 = (field: string, message: string) =>
  new AppError(400, 'invalid_upload', message, { [field]: message });

// The header line decides the delimiter; a header longer than this is not a spreadsheet's.
const HEADER_PEEK_BYTES = 64 * 1024;

/**
 * Reads the one CSV file of a multipart request into `sink`, row by row, as it arrives. Resolves
 * when the file has been read; rejects with the refusal (AppError) otherwise, the rest of the
 * request being drained so the answer still reaches the client.
 */
export function streamCsvUpload(
  req: Request,
  limits: CsvUploadLimits,
  sink: CsvRowSink,
): Promise<CsvUploadInfo> {
  const { field, maxBytes, maxRows, what } = limits;
  return new Promise((resolve, reject) => {
    let form: busboy.Busboy;
    try {
      form = busboy({ headers: req.headers, limits: { fileSize: maxBytes, files: 1, parts: 8 } });
    } catch {
      return reject(upload400(field, 'Choose a CSV file'));
    }
    let settled = false;
    let info: CsvUploadInfo | null = null;
    let formClosed = false;
    let sawFile = false;
    const fail = (error: unknown) => {
      if (settled) return;
      settled = true;
      req.unpipe(form);
      req.resume();
      reject(error);
    };
    const finish = () => {
      if (settled || !formClosed || !info) return;
      settled = true;
      resolve(info);
    };

    form.on('file', (name, stream, meta) => {
      if (name !== field || sawFile) return void stream.resume();
      sawFile = true;
      const fileName = meta.filename || 'the file';
      const hash = createHash('sha256');
      let bytes = 0;
      let rows = 0;
      let sawHeader = false;
      let parser: Parser | null = null;
      let peeked: Buffer[] = [];

      const startParser = () => {
        const head = Buffer.concat(peeked).toString('utf8');
        const delimiter = detectDelimiter(head);
        parser = parse({
          bom: true,
          delimiter,
          skip_empty_lines: true,
          relax_column_count: true,
          trim: true,
          info: true,
        });
        parser.on('data', ({ record, info: at }: { record: string[]; info: { lines: number } }) => {
          if (settled) return;
          try {
            if (!sawHeader) {
              sawHeader = true;
              sink.header({ delimiter, header: record.map(normaliseHeader) });
              return;
            }
            if (++rows > maxRows) {
              throw invalid({
                file: `${fileName} has more than ${maxRows.toLocaleString('en-US')} ${what}s; at most ${maxRows.toLocaleString('en-US')} ${what}s per file`,
              });
            }
            sink.row(record, at.lines);
          } catch (error) {
            parser!.destroy();
            stream.resume();
            fail(error);
          }
        });
        parser.on('error', (error) =>
          fail(invalid({ file: `${fileName} is not readable CSV: ${error.message}` })),
        );
        parser.on('drain', () => stream.resume());
        parser.on('end', () => {
          if (!sawHeader)
            return fail(
              invalid({
                file: `${fileName} is empty; it needs a header row and at least one ${what}`,
              }),
            );
          if (!rows) return fail(invalid({ file: `${fileName} has a header row but no ${what}s` }));
          info = { fileName, rows, bytes, digest: hash.digest('hex') };
          finish();
        });
        for (const chunk of peeked) parser.write(chunk);
        peeked = [];
      };

      stream.on('data', (chunk: Buffer) => {
        if (settled) return;
        bytes += chunk.length;
        hash.update(chunk);
        if (parser) {
          if (!parser.write(chunk)) stream.pause();
          return;
        }
        peeked.push(chunk);
        if (chunk.includes(0x0a) || bytes >= HEADER_PEEK_BYTES) startParser();
      });
      stream.on('limit', () => {
        (parser as Parser | null)?.destroy();
        const message = `${fileName} is larger than ${mb(maxBytes)}; at most ${mb(maxBytes)} per file`;
        fail(new AppError(413, 'invalid_upload', message, { [field]: message }));
      });
      stream.on('end', () => {
        if (settled) return;
        if (!parser) startParser();
        parser!.end();
      });
    });
    form.on('close', () => {
      formClosed = true;
      if (!sawFile) return fail(upload400(field, 'Choose a CSV file'));
      finish();
    });
    form.on('error', (error: Error) => fail(upload400(field, `Upload refused: ${error.message}`)));
    req.on('aborted', () => fail(upload400(field, 'The upload was cut off; send the file again')));
    req.pipe(form);
  });
}
