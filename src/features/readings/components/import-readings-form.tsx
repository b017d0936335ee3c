import { useCallback, useState, type FormEvent } from 'react';
import { READING_IMPORT_LIMITS } from '../../../../shared/schemas/readings';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useCommitImport, usePreviewImport } from '../api/import-readings';
import type { ImportPreview, ImportResult } from '../api/types';
import { ImportPreviewTable } from './import-preview-table';
import { ImportProgress, progressed, type ImportStage } from './import-progress';

const plural = (n: number, one: string, many: string) =>
  `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;

interface Problem {
  fileError: string | null;
  message: string | null;
  lines: string[];
}
const noProblem: Problem = { fileError: null, message: null, lines: [] };

const MAX_MB = READING_IMPORT_LIMITS.maxBytes / 1024 / 1024;
/** The server's limit, said before a byte is sent. */
const tooLarge = (file: File) =>
  file.size > READING_IMPORT_LIMITS.maxBytes
    ? `${file.name} is larger than ${MAX_MB} MB; at most ${MAX_MB} MB per file`
    : null;

/** Splits a failed call into what goes beside the file input and what goes above the table. */
function problemOf(error: unknown): Problem {
  if (!isApiError(error)) return { ...noProblem, message: 'Something went wrong. Try again.' };
  const { file, ...rest } = error.fields;
  const lines = Object.values(rest);
  return {
    fileError: file ?? null,
    message: file && lines.length === 0 ? null : error.message,
    lines,
  };
}

/**
 * Check a CSV of readings (every row, nothing written), then import it in one go. Importing is
 * offered only when no row has an error; the server checks the whole file again on commit. Both
 * show how much of the file is sent, then what the server is doing.
 */
export function ImportReadingsForm({ orgId, timeZone }: { orgId: string; timeZone: string }) {
  const [stage, setStage] = useState<ImportStage | null>(null);
  const onProgress = useCallback((sent: number) => setStage((s) => progressed(s, sent)), []);
  const previewCall = usePreviewImport(orgId, onProgress);
  const commitCall = useCommitImport(orgId, onProgress);
  const start = (step: ImportStage['step'], chosen: File) =>
    setStage({ step, fileName: chosen.name, sent: 0, sentAt: null });
  const [file, setFile] = useState<File | null>(null);
  const [inputKey, setInputKey] = useState(0);
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [result, setResult] = useState<ImportResult | null>(null);
  const [problem, setProblem] = useState<Problem>(noProblem);

  const chooseFile = (next: File | null) => {
    setFile(next);
    setPreview(null);
    setProblem(noProblem);
    setResult(null);
  };

  const check = async (event: FormEvent) => {
    event.preventDefault();
    setResult(null);
    setPreview(null);
    if (!file) {
      setProblem({ ...noProblem, fileError: 'Choose a CSV file' });
      return;
    }
    const refused = tooLarge(file);
    if (refused) {
      setProblem({ ...noProblem, fileError: refused });
      return;
    }
    setProblem(noProblem);
    start('check', file);
    try {
      setPreview(await previewCall.mutateAsync(file));
    } catch (error) {
      setProblem(problemOf(error));
    } finally {
      setStage(null);
    }
  };

  const commit = async () => {
    if (!file) return;
    setProblem(noProblem);
    start('import', file);
    try {
      const imported = await commitCall.mutateAsync(file);
      setResult(imported);
      setPreview(null);
      setFile(null);
      setInputKey((key) => key + 1);
    } catch (error) {
      setProblem(problemOf(error));
    } finally {
      setStage(null);
    }
  };

  const summary = preview?.summary;
  const errorRows = preview?.rows.filter((row) => row.status === 'error') ?? [];

  return (
    <div className="flex flex-col gap-5">
      <form onSubmit={check} noValidate className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="flex-1">
          <TextField
            key={inputKey}
            label="CSV file"
            type="file"
            accept=".csv,text/csv,text/plain"
            error={problem.fileError ?? undefined}
            onChange={(event) => chooseFile(event.target.files?.[0] ?? null)}
            className="py-2 file:mr-3 file:rounded-md file:border-0 file:bg-field-100 file:px-3 file:py-1.5 file:font-bold file:text-field-900"
          />
        </div>
        <Button
          type="submit"
          variant="secondary"
          icon="check"
          pending={previewCall.isPending}
          className="w-full sm:w-auto"
        >
          Check file
        </Button>
      </form>

      {stage ? <ImportProgress stage={stage} /> : null}

      {result ? (
        <Alert tone="success">
          Imported {plural(result.added, 'reading', 'readings')} (
          {plural(result.duplicates, 'was', 'were')} already there).
        </Alert>
      ) : null}

      {problem.message ? (
        <Alert title={problem.message}>
          {problem.lines.length > 0 ? (
            <ul className="list-disc pl-5">
              {problem.lines.map((line) => (
                <li key={line}>{line}</li>
              ))}
            </ul>
          ) : null}
        </Alert>
      ) : null}

      {preview && summary ? (
        <div className="flex flex-col gap-3">
          {summary.errors > 0 ? (
            <Alert
              title={`${plural(summary.errors, 'row has errors', 'rows have errors')}: nothing will be imported until they are fixed`}
            >
              <ul className="list-disc pl-5">
                {errorRows.map((row) => (
                  <li key={row.line}>{row.error}</li>
                ))}
                {summary.errors > errorRows.length ? (
                  <li>
                    …and {plural(summary.errors - errorRows.length, 'more row', 'more rows')} (the
                    first {errorRows.length} are listed)
                  </li>
                ) : null}
              </ul>
              <p className="mt-1">Fix them in the file, choose it again and check it again.</p>
            </Alert>
          ) : (
            <Alert tone="info">
              {plural(summary.total, 'row', 'rows')} checked: {summary.new.toLocaleString('en-US')}{' '}
              new, {summary.duplicates.toLocaleString('en-US')} already there.
              {summary.new === 0 ? ' There is nothing new to import.' : null}
            </Alert>
          )}
          {preview.rows.length < summary.total ? (
            <p className="text-sm text-field-700">
              Every row was checked. Listed below: the first rows of the file and its first errors,{' '}
              {preview.rows.length.toLocaleString('en-US')} of{' '}
              {plural(summary.total, 'row', 'rows')}.
            </p>
          ) : null}
          <ImportPreviewTable rows={preview.rows} timeZone={timeZone} />
          <div>
            <Button
              icon="check"
              onClick={commit}
              pending={commitCall.isPending}
              disabled={summary.errors > 0 || summary.new === 0}
              className="w-full sm:w-auto"
            >
              Import {plural(summary.new, 'reading', 'readings')}
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
