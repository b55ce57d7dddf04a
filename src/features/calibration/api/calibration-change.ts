import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CalibrationView, PredictionRecompute } from '@shared/views/calibration';
import { calibrationKeys } from './calibration-keys';

/** What accepting or withdrawing answers: the calibration as it now stands and what was recomputed. */
export type CalibrationChange = { calibration: CalibrationView; recomputed: PredictionRecompute };

/**
 * Shared by accept and withdraw. Both change every stored prediction of the programme, so
 * besides this feature's own queries the caller's `onChanged` refreshes whatever shows predictions.
 */
export function useCalibrationChange<T>(programmeId: number, call: (input: T) => Promise<CalibrationChange>, onChanged?: () => void) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: call,
    onSuccess: async ({ calibration }) => {
      queryClient.setQueryData(calibrationKeys.detail(programmeId, calibration.id), { calibration });
      await queryClient.invalidateQueries({ queryKey: calibrationKeys.all });
      onChanged?.();
    },
  });
}
