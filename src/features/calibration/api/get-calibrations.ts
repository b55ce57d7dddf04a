import { queryOptions, useQuery } from '@tanstack/react-query';
import type { CalibrationListView } from '@shared/views/calibration';
import { api } from '@/lib/api-client';
import { calibrationKeys } from './calibration-keys';

export const getCalibrations = (programmeId: number) => api.get<CalibrationListView>(`/api/programmes/${programmeId}/calibrations`);

export const calibrationsQueryOptions = (programmeId: number) =>
  queryOptions({ queryKey: calibrationKeys.list(programmeId), queryFn: () => getCalibrations(programmeId) });

/** A programme's calibration history, newest first, and the one in use. */
export const useCalibrations = (programmeId: number) => useQuery(calibrationsQueryOptions(programmeId));
