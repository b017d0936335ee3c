import { useState, type FormEvent } from 'react';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useCommitImport, usePreviewImport } from '../api/import-readings';
import type { ImportPreview, ImportResult } from '../api/types';
import { ImportPreviewTable } from './import-preview-table';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

interface Problem {
  fileError: string | null;
  message: string | null;
  lines: string[];
}
const noProblem: Problem = { fileError: null, message: null, lines: [] };

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
 * offered only when no row has an error; the server checks the whole file again on commit.
 */
export function ImportReadingsForm({ orgId, timeZone }: { orgId: string; timeZone: string }) {
  const previewCall = usePreviewImport(orgId);
  const commitCall = useCommitImport(orgId);
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
    setProblem(noProblem);
    try {
      setPreview(await previewCall.mutateAsync(file));
    } catch (error) {
      setProblem(problemOf(error));
    }
  };

  const commit = async () => {
    if (!file) return;
    setProblem(noProblem);
    try {
      const imported = await commitCall.mutateAsync(file);
      setResult(imported);
      setPreview(null);
      setFile(null);
      setInputKey((key) => key + 1);
    } catch (error) {
      setProblem(problemOf(error));
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
              </ul>
              <p className="mt-1">Fix them in the file, choose it again and check it again.</p>
            </Alert>
          ) : (
            <Alert tone="info">
              {plural(summary.total, 'row', 'rows')} checked: {summary.new} new,{' '}
              {summary.duplicates} already there.
              {summary.new === 0 ? ' There is nothing new to import.' : null}
            </Alert>
          )}
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
