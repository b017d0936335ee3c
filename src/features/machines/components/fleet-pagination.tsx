import { Button } from '../../../components/ui/button';

const count = new Intl.NumberFormat();

/** "26–50 of 2,000 machines" with previous and next: the server counts, the client never fetches all. */
export function FleetPagination({
  page,
  pageSize,
  total,
  onPage,
  pending,
}: {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  pending: boolean;
}) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav
      aria-label="Fleet pages"
      className="flex flex-col items-stretch gap-3 sm:flex-row sm:items-center sm:justify-between"
    >
      <p className="text-field-700" aria-live="polite">
        {total === 0
          ? 'No machines'
          : `${count.format(first)}–${count.format(last)} of ${count.format(total)} ${
              total === 1 ? 'machine' : 'machines'
            }`}
        {pages > 1 ? (
          <span className="text-field-600">
            {' '}
            · page {count.format(page)} of {count.format(pages)}
          </span>
        ) : null}
      </p>
      {pages > 1 ? (
        <div className="grid grid-cols-2 gap-2 sm:flex">
          <Button
            variant="secondary"
            icon="back"
            disabled={page <= 1 || pending}
            onClick={() => onPage(page - 1)}
          >
            Previous page
          </Button>
          <Button
            variant="secondary"
            disabled={page >= pages || pending}
            onClick={() => onPage(page + 1)}
          >
            Next page
          </Button>
        </div>
      ) : null}
    </nav>
  );
}
