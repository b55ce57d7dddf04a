import { useRef, type KeyboardEvent } from 'react';
import { MATERIAL_KINDS, type MaterialKind } from '@shared/schemas/materials';
import { KIND_SPECS } from './material-fields';

export const tabId = (kind: MaterialKind) => `library-tab-${kind}`;
export const panelId = (kind: MaterialKind) => `library-panel-${kind}`;

/**
 * The four kinds as tabs with the keyboard behaviour of the WAI-ARIA tabs pattern:
 * one tab stop, arrow keys move between tabs and select them, Home and End jump to the ends.
 */
export function KindTabs({ current, onChange }: { current: MaterialKind; onChange: (kind: MaterialKind) => void }) {
  const refs = useRef<Record<string, HTMLButtonElement | null>>({});
  const move = (event: KeyboardEvent, index: number) => {
    const last = MATERIAL_KINDS.length - 1;
    const target = { ArrowRight: index === last ? 0 : index + 1, ArrowLeft: index === 0 ? last : index - 1, Home: 0, End: last }[event.key];
    if (target === undefined) return;
    event.preventDefault();
    const kind = MATERIAL_KINDS[target];
    onChange(kind);
    refs.current[kind]?.focus();
  };
  return (
    <div role="tablist" aria-label="Kinds of material" className="inline-flex self-start rounded-md border border-line bg-panel p-1">
      {MATERIAL_KINDS.map((kind, index) => (
        <button
          key={kind}
          ref={(element) => {
            refs.current[kind] = element;
          }}
          id={tabId(kind)}
          role="tab"
          type="button"
          aria-selected={current === kind}
          aria-controls={current === kind ? panelId(kind) : undefined}
          tabIndex={current === kind ? 0 : -1}
          onClick={() => onChange(kind)}
          onKeyDown={(event) => move(event, index)}
          className={`rounded px-4 py-1.5 text-sm ${current === kind ? 'bg-fjord-500 font-medium text-white' : 'text-ink-soft hover:bg-paper'}`}
        >
          {KIND_SPECS[kind].tab}
        </button>
      ))}
    </div>
  );
}
