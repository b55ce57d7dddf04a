import { api } from '@/lib/api-client';
import { useCalibrationChange, type CalibrationChange } from './calibration-change';

export const acceptCalibration = (programmeId: number, id: number) => api.post<CalibrationChange>(`/api/programmes/${programmeId}/calibrations/${id}/accept`);

/** Puts a proposed calibration in use; the server recomputes the programme's predictions with it. */
export const useAcceptCalibration = (programmeId: number, onChanged?: () => void) =>
  useCalibrationChange<number>(programmeId, (id) => acceptCalibration(programmeId, id), onChanged);
