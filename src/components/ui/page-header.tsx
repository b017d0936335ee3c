import type { ReactNode } from 'react';

/** The page's one h1, with what the page is for and its main actions. */
export function PageHeader({
  title,
  description,
  actions,
}: {
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
}) {
  return (
    <header className="mb-6 flex flex-wrap items-end justify-between gap-3">
      {/* React 19 hoists <title> into the document head */}
      <title>{`${title} · Hourstone`}</title>
      <div className="min-w-0">
        <h1 className="text-2xl font-black text-field-950 sm:text-3xl">{title}</h1>
        {description ? <div className="mt-1 text-field-700">{description}</div> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-2">{actions}</div> : null}
    </header>
  );
}
