import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CalibrationView } from '@shared/views/calibration';
import { api } from '@/lib/api-client';
import { calibrationKeys } from './calibration-keys';

export const getCalibration = (programmeId: number, id: number) => api.get<{ calibration: CalibrationView }>(`/api/programmes/${programmeId}/calibrations/${id}`);

export const calibrationQueryOptions = (programmeId: number, id: number) =>
  queryOptions({ queryKey: calibrationKeys.detail(programmeId, id), queryFn: () => getCalibration(programmeId, id), select: (data) => data.calibration });

/** One calibration with the fit's whole report (null id: nothing chosen). */
export const useCalibration = (programmeId: number, id: number | null) => useQuery({ ...calibrationQueryOptions(programmeId, id ?? 0), enabled: id !== null });
