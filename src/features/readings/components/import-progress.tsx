import { useEffect, useState } from 'react';

/** Where a check or an import of a file stands: how much is sent, then the server's work. */
export interface ImportStage {
  step: 'check' | 'import';
  fileName: string;
  /** share of the file sent, 0–1 */
  sent: number;
  /** when the last byte went (ms), so the wait for the server's answer can be counted */
  sentAt: number | null;
}

/** The next stage when the upload reports `sent`. */
export const progressed = (stage: ImportStage | null, sent: number): ImportStage | null =>
  stage && { ...stage, sent, sentAt: sent >= 1 ? (stage.sentAt ?? Date.now()) : null };

function useSecondsSince(since: number | null) {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (since === null) return;
    const timer = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(timer);
  }, [since]);
  return since === null ? 0 : Math.max(0, Math.round((now - since) / 1000));
}

/**
 * The server reads the rows as the file arrives, so the share sent is the share read; after the
 * last byte it checks every row against its neighbours and (importing) writes them, which the
 * page shows as a step with the seconds waited so far.
 */
export function ImportProgress({ stage }: { stage: ImportStage }) {
  const waited = useSecondsSince(stage.sentAt);
  const sending = stage.sentAt === null;
  const percent = Math.round(stage.sent * 100);
  const label = sending
    ? `Sending and reading ${stage.fileName}: ${percent} %`
    : stage.step === 'check'
      ? 'Checking rows…'
      : 'Checking rows and writing readings…';
  return (
    <div
      role="status"
      className="flex flex-col gap-2 rounded-xl border border-field-200 bg-white p-3"
    >
      <p className="font-bold text-field-900">
        {label}
        {!sending && waited >= 2 ? <span className="font-normal"> {waited} s</span> : null}
      </p>
      <div
        role="progressbar"
        aria-label={`Sending ${stage.fileName}`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={percent}
        className="h-2 overflow-hidden rounded-full bg-field-100"
      >
        <div className="h-full bg-field-700" style={{ width: `${percent}%` }} />
      </div>
      {stage.step === 'import' ? (
        <p className="text-sm text-field-700">
          All or nothing: until the answer comes, nothing is saved. If the connection drops, send
          the file again — rows already there are skipped.
        </p>
      ) : null}
    </div>
  );
}
