import { Button } from './button';

/** "Showing 26–42 of 42 tasks" with previous/next; the total is the server's meta.total. */
export function Pager({
  page,
  pageSize,
  total,
  onPage,
  label,
  noun,
}: {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  /** the navigation's name, e.g. "Pages of the due list" */
  label: string;
  /** singular and plural of what is counted */
  noun: [string, string];
}) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav aria-label={label} className="flex flex-wrap items-center gap-3">
      <p className="text-field-700" aria-live="polite">
        Showing {first}–{last} of {total} {total === 1 ? noun[0] : noun[1]}
      </p>
      {pages > 1 ? (
        <div className="ml-auto flex gap-2">
          <Button
            variant="secondary"
            icon="back"
            disabled={page <= 1}
            onClick={() => onPage(page - 1)}
          >
            Previous page
          </Button>
          <Button variant="secondary" disabled={page >= pages} onClick={() => onPage(page + 1)}>
            Next page
          </Button>
        </div>
      ) : null}
    </nav>
  );
}
