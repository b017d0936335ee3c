import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import type {
  FleetImportPreview,
  FleetImportResult,
} from '../../../../shared/schemas/fleet-import';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { isApiError } from '../../../lib/api-client';
import { useCommitFleetImport, usePreviewFleetImport } from '../api/fleet-import';
import { FleetPreviewTable } from './fleet-preview-table';

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
 * Check a fleet file (every row, nothing written), then import it in one go. Importing is offered
 * only when no row has an error; the server checks the whole file again on commit.
 */
export function FleetImportForm({ orgId, fleetHref }: { orgId: string; fleetHref: string }) {
  const previewCall = usePreviewFleetImport(orgId);
  const commitCall = useCommitFleetImport(orgId);
  const [file, setFile] = useState<File | null>(null);
  const [inputKey, setInputKey] = useState(0);
  const [preview, setPreview] = useState<FleetImportPreview | null>(null);
  const [result, setResult] = useState<FleetImportResult | null>(null);
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
      setResult(await commitCall.mutateAsync(file));
      setPreview(null);
      setFile(null);
      setInputKey((key) => key + 1);
    } catch (error) {
      setProblem(problemOf(error));
    }
  };

  const summary = preview?.summary;
  const errorRows = preview?.rows.filter((row) => row.outcome === 'error') ?? [];
  const changing = summary ? summary.create + summary.update : 0;

  return (
    <div className="flex flex-col gap-5">
      <form onSubmit={check} noValidate className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="flex-1">
          <TextField
            key={inputKey}
            label="Fleet file (CSV)"
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
        <Alert tone="success" title="The fleet is imported">
          <p>
            {plural(result.created, 'machine added', 'machines added')},{' '}
            {plural(result.updated, 'machine updated', 'machines updated')}, {result.unchanged}{' '}
            already as in the file.
          </p>
          {result.historyUnknown > 0 ? (
            <p>
              {plural(result.historyUnknown, 'task has', 'tasks have')} no known last service: open
              each machine to set when it was last done.
            </p>
          ) : null}
          <Link to={fleetHref} className="font-bold underline underline-offset-2">
            Open the fleet
          </Link>
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
                {errorRows
                  .flatMap((row) => row.errors)
                  .map((error) => (
                    <li key={error}>{error}</li>
                  ))}
              </ul>
              <p className="mt-1">Fix them in the file, choose it again and check it again.</p>
            </Alert>
          ) : (
            <Alert tone="info">
              {plural(summary.total, 'row', 'rows')} checked: {summary.create} new, {summary.update}{' '}
              to update, {summary.unchanged} already as in the file.
              {changing === 0 ? ' There is nothing to import.' : null}
            </Alert>
          )}
          {preview.columns.ignored.length > 0 ? (
            <p className="text-sm text-field-700">
              Columns left alone: {preview.columns.ignored.join(', ')}.
            </p>
          ) : null}
          <FleetPreviewTable rows={preview.rows} />
          <div>
            <Button
              icon="check"
              onClick={commit}
              pending={commitCall.isPending}
              disabled={summary.errors > 0 || changing === 0}
              className="w-full sm:w-auto"
            >
              Import {plural(changing, 'machine', 'machines')}
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
