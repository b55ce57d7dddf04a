// Public face of the shelf-life feature: the programme analysis query, read by the recipe page and the map.
export { shelfLifeKeys } from './api/shelf-life-keys';
export { programmeShelfLifeQueryOptions, useProgrammeShelfLife } from './api/get-programme-shelf-life';
