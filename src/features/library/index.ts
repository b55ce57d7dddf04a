/**
 * The material library. Other features pick materials with these: the live entries of a kind
 * (one cache entry with the library screen's list) and the options of a select over them.
 */
export { materialKeys, type MaterialFilters } from './api/material-keys';
export { liveMaterialsQueryOptions, useLiveMaterials } from './api/get-live-materials';
export { MaterialOptions, describeMaterial } from './components/material-options';
