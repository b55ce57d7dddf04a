/**
 * The programme a screen works on. In a route component:
 *
 *   const selection = useProgrammeParam();          // ?programme=ID, else the first live programme
 *   <ProgrammePicker programmes={selection.programmes} value={selection.programmeId} onChange={selection.setProgrammeId} />
 *   <ProgrammeGate selection={selection} canCreate={can(role, 'programmes.write')}>
 *     {(programme) => <YourScreen programmeId={programme.id} />}
 *   </ProgrammeGate>
 *
 * `withProgramme('/bench', id)` builds a link that carries the choice to another screen.
 */
export { useProgrammeParam, withProgramme, PROGRAMME_PARAM, type ProgrammeSelection } from './hooks/use-programme-param';
export { ProgrammePicker } from './components/programme-picker';
export { ProgrammeGate } from './components/programme-gate';
export { ProgrammeForm } from './components/programme-form';
export { ATTRACTION_SOURCE_LABELS } from './components/attraction-source-labels';
export { useProgrammes, programmesQueryOptions } from './api/get-programmes';
export { useProgramme, programmeQueryOptions } from './api/get-programme';
export { useCreateProgramme } from './api/create-programme';
export { programmeKeys } from './api/programme-keys';
