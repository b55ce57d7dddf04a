/**
 * Shortlists. Other features read a programme's shortlists, add recipes to a draft one and
 * refresh them with shortlistKeys; the screens are composed in src/app/routes.
 */
export { shortlistKeys, type ShortlistFilters } from './api/shortlist-keys';
export { shortlistsQueryOptions, useShortlists, type ShortlistSummary } from './api/get-shortlists';
export { shortlistQueryOptions, useShortlist } from './api/get-shortlist';
export { useAddToShortlist } from './api/add-to-shortlist';
