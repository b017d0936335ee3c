import { useState } from 'react';
import { Button, buttonClasses } from '../../../components/ui/button';
import { ErrorState } from '../../../components/ui/error-state';
import { Icon } from '../../../components/ui/icons';
import { PageHeader } from '../../../components/ui/page-header';
import { PageSkeleton } from '../../../components/ui/skeleton';
import { labelSvgUrl, useLabelMachine } from '../api/label';

/**
 * A machine's QR label to print or download. Scanning it on a phone opens the machine's
 * walkaround. Printing shows the label alone (the app's frame and these buttons are hidden).
 */
export function MachineLabel({ orgId, machineId }: { orgId: string; machineId: string }) {
  const machine = useLabelMachine(orgId, machineId);
  const [imageFailed, setImageFailed] = useState(false);

  if (machine.isPending) return <PageSkeleton label="Loading the label" />;
  if (machine.isError)
    return (
      <ErrorState
        title="The label didn't load"
        message={machine.error.message}
        onRetry={() => machine.refetch()}
        retrying={machine.isRefetching}
      />
    );
  const { fleetNumber, name } = machine.data;

  return (
    <>
      <div className="print:hidden">
        <PageHeader
          title={`QR label · ${fleetNumber}`}
          description={`Print it and fix it where the operator sees it before climbing on. Scanning it opens the walkaround of ${fleetNumber}.`}
          actions={
            <>
              <Button className="min-h-12" onClick={() => window.print()}>
                Print
              </Button>
              <a
                href={labelSvgUrl(orgId, machineId, true)}
                download={`${fleetNumber}-label.svg`}
                className={buttonClasses('secondary', 'min-h-12')}
              >
                <Icon name="download" />
                Download SVG
              </a>
            </>
          }
        />
      </div>
      <div className="flex justify-center rounded-xl border border-field-200 bg-white p-6 print:block print:rounded-none print:border-0 print:bg-transparent print:p-0">
        {imageFailed ? (
          <p role="alert" className="text-poppy-800">
            The label image could not be loaded. Check the connection and reload the page.
          </p>
        ) : (
          <img
            src={labelSvgUrl(orgId, machineId)}
            alt={`Walkaround QR code for ${fleetNumber} ${name}`}
            width={227}
            height={287}
            className="h-auto w-[60mm] max-w-full"
            onError={() => setImageFailed(true)}
          />
        )}
      </div>
      <p className="mt-4 text-sm text-field-600 print:hidden">
        Printed at 100 % the label is 60 × 76 mm. Use weatherproof label stock outdoors.
      </p>
    </>
  );
}
