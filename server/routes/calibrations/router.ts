import { calibrationFitSchema, calibrationParamSchema, programmeIdParamSchema } from '../../../shared/schemas/calibrations';
import type { CalibrationListView } from '../../../shared/views/calibration';
import { route } from '../../http/route';
import { presentCalibration, presentCalibrationSummary } from '../../presenters/calibration';
import { acceptCalibration, fitProgrammeCalibration, listCalibrations, loadCalibration, withdrawCalibration } from '../../services/calibrations';

/** Calibrations of a programme's gel boundary to its bench observations. Literal paths first. */
export const calibrationRoutes = [
  route({
    method: 'get',
    path: '/api/programmes/:id/calibrations',
    access: 'data.read',
    summary: "A programme's calibrations, newest first, and the one in use",
    params: programmeIdParamSchema,
    async handler({ params }) {
      const items = (await listCalibrations(params.id)).map(presentCalibrationSummary);
      const body: CalibrationListView = { items, inUse: items.find((c) => c.status === 'accepted') ?? null };
      return { body };
    },
  }),
  route({
    method: 'post',
    path: '/api/programmes/:id/calibrations',
    access: 'calibrations.fit',
    summary: 'Fit the gel boundary to the programme’s bench observations and keep the fit as a proposal',
    params: programmeIdParamSchema,
    body: calibrationFitSchema,
    // The fit runs outside any transaction; the service writes its result in one of its own.
    transactional: false,
    async handler(ctx) {
      return { status: 201, body: { calibration: presentCalibration(await fitProgrammeCalibration(ctx, ctx.params.id, ctx.body)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/programmes/:id/calibrations/withdraw',
    access: 'calibrations.accept',
    summary: 'Go back to the uncalibrated theory and recompute the programme’s predictions',
    params: programmeIdParamSchema,
    async handler(ctx) {
      const { calibration, recomputed } = await withdrawCalibration(ctx, ctx.params.id);
      return { body: { calibration: presentCalibration(calibration), recomputed } };
    },
  }),
  route({
    method: 'get',
    path: '/api/programmes/:id/calibrations/:calibrationId',
    access: 'data.read',
    summary: 'One calibration with its whole report',
    params: calibrationParamSchema,
    async handler({ params }) {
      return { body: { calibration: presentCalibration(await loadCalibration(params.id, params.calibrationId, null)) } };
    },
  }),
  route({
    method: 'post',
    path: '/api/programmes/:id/calibrations/:calibrationId/accept',
    access: 'calibrations.accept',
    summary: 'Use a proposed calibration for the programme: supersede the one in use and recompute every stored prediction',
    params: calibrationParamSchema,
    async handler(ctx) {
      const { calibration, recomputed } = await acceptCalibration(ctx, ctx.params.id, ctx.params.calibrationId);
      return { body: { calibration: presentCalibration(calibration), recomputed } };
    },
  }),
];
