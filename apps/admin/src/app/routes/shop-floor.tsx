import { useState } from 'react';
import { Alert } from '../../components/ui/alert';
import { Button, ButtonLink } from '../../components/ui/button';
import { PageHeading } from '../../components/ui/page-heading';
import { paths } from '../../config/paths';
import { MachineFloor } from '../../features/machines/components/machine-floor';
import { ReportProblemDialog, type ReportedMachine } from '../../features/tag-outs/components/report-problem-dialog';

export default function ShopFloorRoute() {
  const [reporting, setReporting] = useState<ReportedMachine | null>(null);
  const [reported, setReported] = useState<string | null>(null);
  return (
    <>
      <PageHeading
        title="Shop floor"
        description="Every machine in the shop, area by area, with its state as it changes on the floor."
        actions={<ButtonLink to={paths.reportIncident.getHref()}>Report an incident</ButtonLink>}
      />
      {reported && (
        <Alert tone="success">The {reported} is tagged out. The admins have been told.</Alert>
      )}
      <MachineFloor
        action={(machine, live) =>
          live?.state === 'tagged_out' ? null : (
            <Button
              variant="quiet"
              aria-label={`Report a problem with the ${machine.name}`}
              onClick={() => {
                setReported(null);
                setReporting({ id: machine.id, name: machine.name });
              }}
            >
              Report a problem
            </Button>
          )
        }
      />
      <ReportProblemDialog
        machine={reporting}
        onClose={() => setReporting(null)}
        onReported={() => {
          setReported(reporting?.name ?? null);
          setReporting(null);
        }}
      />
    </>
  );
}
