import { useState } from 'react';
import { CATEGORY_LABELS, type MachineCategory } from '../../../../shared/constants';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { ErrorState } from '../../../components/ui/error-state';
import { PageSkeleton } from '../../../components/ui/skeleton';
import { isApiError } from '../../../lib/api-client';
import { useDeleteTemplate } from '../api/delete-template';
import { useBuiltIn } from '../api/get-built-in';
import { useTemplates } from '../api/get-templates';
import { CategoryList } from './category-list';
import { ChecklistEditor } from './checklist-editor';

/** The manager's checklists: categories on one side, the chosen category's list to edit. */
export function ChecklistsView({
  orgId,
  category,
  hrefFor,
}: {
  orgId: string;
  category: MachineCategory;
  hrefFor: (category: MachineCategory) => string;
}) {
  const templates = useTemplates(orgId);
  const template = templates.data?.data.find((t) => t.category === category) ?? null;
  const builtIn = useBuiltIn(orgId, category, templates.isSuccess && !template);
  const remove = useDeleteTemplate(orgId);
  const [confirming, setConfirming] = useState(false);
  const [savedCategory, setSavedCategory] = useState<MachineCategory | null>(null);

  if (templates.isPending) return <PageSkeleton label="Loading checklists" />;
  if (templates.isError)
    return (
      <ErrorState
        title="The checklists didn't load"
        message={templates.error.message}
        onRetry={() => templates.refetch()}
        retrying={templates.isRefetching}
      />
    );

  const start = template ?? builtIn.data;
  return (
    <div className="grid gap-6 lg:grid-cols-[14rem_minmax(0,1fr)]">
      <CategoryList templates={templates.data.data} current={category} hrefFor={hrefFor} />
      <section aria-labelledby="checklist-heading" className="flex min-w-0 flex-col gap-4">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="checklist-heading" className="text-2xl font-black text-field-950">
            {CATEGORY_LABELS[category]} checklist
          </h2>
          {template && templates.data.abilities.edit ? (
            <Button variant="ghost" className="min-h-12" onClick={() => setConfirming(true)}>
              Go back to the built-in list
            </Button>
          ) : null}
        </div>
        {start ? (
          // keyed: another category, or the farm's list replacing the built-in one, starts afresh
          <ChecklistEditor
            key={`${category}:${template?.id ?? 'built-in'}`}
            orgId={orgId}
            category={category}
            template={template}
            start={start}
            justSaved={savedCategory === category}
            onSaved={() => setSavedCategory(category)}
          />
        ) : builtIn.isError ? (
          <ErrorState
            title="The built-in list didn't load"
            message={builtIn.error.message}
            onRetry={() => builtIn.refetch()}
            retrying={builtIn.isRefetching}
          />
        ) : (
          <PageSkeleton label="Loading the checklist" />
        )}
      </section>
      <ConfirmDialog
        open={confirming}
        title={`Go back to the built-in ${CATEGORY_LABELS[category].toLowerCase()} list?`}
        confirmLabel="Use the built-in list"
        pending={remove.isPending}
        error={
          remove.error ? (isApiError(remove.error) ? remove.error.message : 'That failed.') : null
        }
        onConfirm={() =>
          template && remove.mutate(template.id, { onSuccess: () => setConfirming(false) })
        }
        onCancel={() => setConfirming(false)}
      >
        <p>
          This farm&apos;s own list for this category is removed; walkarounds use Hourstone&apos;s
          built-in list again. Past walkarounds keep the items they were done with.
        </p>
      </ConfirmDialog>
    </div>
  );
}
