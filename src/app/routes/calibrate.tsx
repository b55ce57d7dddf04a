import { useQueryClient } from '@tanstack/react-query';
import { can } from '@shared/permissions';
import { PageHeader } from '@/components/ui/page';
import { useSession } from '@/features/auth/api/get-session';
import { CalibrationScreen } from '@/features/calibration/components/calibration-screen';
import { SafetyNote } from '@/features/cautions/safety-note';
import { ProgrammeGate } from '@/features/programmes/components/programme-gate';
import { ProgrammePicker } from '@/features/programmes/components/programme-picker';
import { useProgrammeParam } from '@/features/programmes/hooks/use-programme-param';

export function CalibrateRoute() {
  const { data: user } = useSession();
  const selection = useProgrammeParam();
  const queryClient = useQueryClient();
  return (
    <>
      <PageHeader
        title="Calibrate"
        subtitle="Fit the map's gel boundary to what the bench observed, check that the fit predicts samples it was not fitted to, and accept it for the programme. The published theory stays one switch away on the map."
      />
      <div className="mb-4">
        <ProgrammePicker programmes={selection.programmes} value={selection.programmeId} onChange={selection.setProgrammeId} />
      </div>
      <ProgrammeGate selection={selection} canCreate={can(user?.role, 'programmes.write')}>
        {(programme) => (
          <div className="flex flex-col gap-5">
            <CalibrationScreen
              programme={programme}
              canFit={can(user?.role, 'calibrations.fit')}
              canAccept={can(user?.role, 'calibrations.accept')}
              // Every stored prediction of the programme changed: recipes, map, bench log, shortlists.
              onPredictionsChanged={() => void queryClient.invalidateQueries()}
            />
            <SafetyNote compact />
          </div>
        )}
      </ProgrammeGate>
    </>
  );
}
