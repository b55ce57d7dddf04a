import { useMutation, useQueryClient } from '@tanstack/react-query';
import type { CalibrationFitInput } from '@shared/schemas/calibrations';
import type { CalibrationView } from '@shared/views/calibration';
import { api } from '@/lib/api-client';
import { calibrationKeys } from './calibration-keys';

export const fitCalibration = (programmeId: number, input: Partial<CalibrationFitInput>) =>
  api.post<{ calibration: CalibrationView }>(`/api/programmes/${programmeId}/calibrations`, input);

/** Fits the programme's bench into a proposed calibration (changes no prediction). */
export function useFitCalibration(programmeId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: Partial<CalibrationFitInput>) => fitCalibration(programmeId, input),
    onSuccess: ({ calibration }) => {
      queryClient.setQueryData(calibrationKeys.detail(programmeId, calibration.id), { calibration });
      return queryClient.invalidateQueries({ queryKey: calibrationKeys.list(programmeId) });
    },
  });
}
