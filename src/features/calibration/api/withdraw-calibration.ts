import { api } from '@/lib/api-client';
import { useCalibrationChange, type CalibrationChange } from './calibration-change';

export const withdrawCalibration = (programmeId: number) => api.post<CalibrationChange>(`/api/programmes/${programmeId}/calibrations/withdraw`);

/** Back to the uncalibrated theory; the server recomputes the programme's predictions without a calibration. */
export const useWithdrawCalibration = (programmeId: number, onChanged?: () => void) =>
  useCalibrationChange<void>(programmeId, () => withdrawCalibration(programmeId), onChanged);
