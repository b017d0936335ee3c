import { useState } from 'react';
import type { UnitSystem } from '../../../../shared/constants';
import { Alert } from '../../../components/ui/alert';
import { Button } from '../../../components/ui/button';
import { Card } from '../../../components/ui/card';
import { ErrorState } from '../../../components/ui/error-state';
import { ListSkeleton } from '../../../components/ui/skeleton';
import { useSpecSheet } from '../api/get-spec-sheet';
import { SpecSheetForm } from './spec-sheet-form';
import { sheetIsEmpty, SpecSheetView } from './spec-sheet-view';

/** The machine's spec sheet: read by everyone who sees the machine, edited by the farm's shop. */
export function SpecSheetSection({
  orgId,
  machineId,
  units,
}: {
  orgId: string;
  machineId: string;
  units: UnitSystem;
}) {
  const sheet = useSpecSheet(orgId, machineId);
  const [editing, setEditing] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);

  if (sheet.isPending) return <ListSkeleton rows={3} label="Loading the spec sheet" />;
  if (sheet.isError)
    return (
      <ErrorState
        title="The spec sheet didn't load"
        message={sheet.error.message}
        onRetry={() => sheet.refetch()}
        retrying={sheet.isRefetching}
      />
    );
  const { data, abilities } = sheet.data;

  if (editing)
    return (
      <Card>
        <SpecSheetForm
          orgId={orgId}
          machineId={machineId}
          sheet={data}
          units={units}
          onCancel={() => setEditing(false)}
          onSaved={(saved) => {
            setEditing(false);
            setNotice(
              saved.tasksUpdated
                ? `Spec sheet saved. ${saved.tasksUpdated} ${saved.tasksUpdated === 1 ? 'task takes' : 'tasks take'} new quantities or part numbers from it.`
                : 'Spec sheet saved.',
            );
          }}
        />
      </Card>
    );

  return (
    <div className="flex flex-col gap-4">
      {notice ? <Alert tone="success">{notice}</Alert> : null}
      <Card>
        {sheetIsEmpty(data) ? (
          <p className="text-field-600">
            Nothing on the sheet yet. Copy the capacities, filter numbers and test pressures from
            the operator's manual; the schedule's changes then take their quantities from here.
          </p>
        ) : (
          <SpecSheetView sheet={data} />
        )}
      </Card>
      {abilities.update ? (
        <div>
          <Button
            variant="secondary"
            icon="wrench"
            onClick={() => {
              setNotice(null);
              setEditing(true);
            }}
          >
            Edit spec sheet
          </Button>
        </div>
      ) : null}
    </div>
  );
}
