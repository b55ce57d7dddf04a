/** The safety note every screen that suggests a composition ends with. */
export { SafetyNote } from './safety-note';
