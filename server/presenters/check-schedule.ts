import type { CheckScheduleView } from '../../shared/views/check-schedules';

/** A recipe's check schedule as the API shows it; no schedule is an empty list of ages. */
export function presentCheckSchedule(recipeId: number, schedule: { agesDays: number[]; updatedAt: Date } | null, updater: { id: number; name: string } | null): CheckScheduleView {
  return {
    recipeId,
    agesDays: schedule?.agesDays ?? [],
    updatedAt: schedule ? schedule.updatedAt.toISOString() : null,
    updatedBy: schedule && updater ? { id: updater.id, name: updater.name } : null,
  };
}
