import { Badge } from '../../../components/ui/badge';
import type { ImportPreviewRow } from '../api/types';

/** A row's import status as words and an icon, never colour alone. */
export function ImportStatus({ row }: { row: ImportPreviewRow }) {
  if (row.status === 'error')
    return (
      <div className="flex flex-col items-start gap-1">
        <Badge tone="overdue" icon="error">
          Error
        </Badge>
        <span className="text-sm font-bold text-poppy-800">{row.error}</span>
      </div>
    );
  if (row.status === 'duplicate')
    return (
      <Badge tone="neutral" icon="info">
        Already there
      </Badge>
    );
  return (
    <Badge tone="ok" icon="check">
      New
    </Badge>
  );
}
