// Check schedules: when the bench looks at a recipe's samples again, and which samples are due.
export { sampleAgeDays } from './sample-age-days';
export { nextCheckAge } from './next-check-age';
export { dueSamples, type ScheduledCheck, type DueSample } from './due-samples';
export { checkFromDue, type DueCheckAnswer } from './check-from-due';
