import { useId, type ReactNode } from 'react';

/** A titled card of the service form (Tasks, The visit, Parts …), one h2 each. */
export function FormBlock({ title, children }: { title: string; children: ReactNode }) {
  const id = useId();
  return (
    <section
      aria-labelledby={id}
      className="flex flex-col gap-5 rounded-xl border border-field-200 bg-white p-4 shadow-card sm:p-6"
    >
      <h2 id={id} className="text-xl font-black text-field-900">
        {title}
      </h2>
      {children}
    </section>
  );
}
