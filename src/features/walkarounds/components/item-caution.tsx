import { Icon } from '../../../components/ui/icons';

const DEFERRAL = "Follow the operator's manual, local regulations and qualified service practice.";

/**
 * The caution beside an item that can hurt someone (PTO, hydraulic pressure, raised loads,
 * stored energy…): the server's text, which ends by deferring to the manual and local rules; a
 * farm's own wording without that line gets it added.
 */
export function ItemCaution({ text }: { text: string }) {
  const defers = /operator's manual/i.test(text);
  return (
    <aside
      aria-label="Caution"
      className="flex gap-2.5 rounded-lg border-2 border-l-8 border-straw-500 bg-straw-50 p-3 text-sm text-straw-900"
    >
      <Icon name="alert" className="mt-0.5 size-5 shrink-0 text-straw-700" />
      <div className="flex min-w-0 flex-col gap-1">
        <p>
          <span className="font-black">Caution. </span>
          {text}
        </p>
        {defers ? null : <p className="font-bold">{DEFERRAL}</p>}
      </div>
    </aside>
  );
}
