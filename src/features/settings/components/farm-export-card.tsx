import { Card } from '../../../components/ui/card';
import { buttonClasses } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icons';
import { farmExportHref } from '../api/farm-export';

/** The manager's download of everything the farm keeps in Hourstone. */
export function FarmExportCard({ orgId }: { orgId: string }) {
  return (
    <Card className="flex flex-col gap-3">
      <p>
        One zip file with your machines, meter readings, service schedules, service records (parts
        and measurements), walkarounds, defects and their photos and invoices. The tables are CSV
        files that open in a spreadsheet; README.txt explains every column.
      </p>
      <div>
        <a className={buttonClasses('secondary')} href={farmExportHref(orgId)} download>
          <Icon name="download" />
          Download the farm’s data
        </a>
      </div>
    </Card>
  );
}
