import { useState } from 'react';
import { MATERIAL_KINDS, type MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { ApiError } from '@/lib/api-client';
import { useArchiveMaterial } from '../api/archive-material';
import { useMaterials } from '../api/get-materials';
import { useRestoreMaterial } from '../api/restore-material';
import { KIND_SPECS } from './material-fields';
import { MaterialForm } from './material-form';
import { MaterialTable } from './material-table';
import { KindTabs, panelId, tabId } from './kind-tabs';

export const isMaterialKind = (value: string | null): value is MaterialKind => MATERIAL_KINDS.includes(value as MaterialKind);

type Editing = { mode: 'closed' } | { mode: 'new' } | { mode: 'edit'; id: number };

/** The material library: a table per kind, and for editors a form to add, replace, archive and restore. */
export function LibraryScreen({ kind, onKindChange, canWrite }: { kind: MaterialKind; onKindChange: (kind: MaterialKind) => void; canWrite: boolean }) {
  return (
    <div className="flex flex-col gap-4">
      <KindTabs current={kind} onChange={onKindChange} />
      <div role="tabpanel" id={panelId(kind)} aria-labelledby={tabId(kind)}>
        <KindPanel key={kind} kind={kind} canWrite={canWrite} />
      </div>
    </div>
  );
}

function KindPanel<K extends MaterialKind>({ kind, canWrite }: { kind: K; canWrite: boolean }) {
  const spec = KIND_SPECS[kind];
  const [showArchived, setShowArchived] = useState(false);
  const [editing, setEditing] = useState<Editing>({ mode: 'closed' });
  const [message, setMessage] = useState<{ tone: 'success' | 'error'; text: string } | null>(null);
  const list = useMaterials(kind, { archived: showArchived ? 'all' : 'false' });
  const archive = useArchiveMaterial(kind);
  const restore = useRestoreMaterial(kind);
  const busyId = archive.isPending ? (archive.variables ?? null) : restore.isPending ? (restore.variables ?? null) : null;

  const act = async (item: MaterialViews[K], action: 'archive' | 'restore') => {
    setMessage(null);
    try {
      if (action === 'archive') await archive.mutateAsync(item.id);
      else await restore.mutateAsync(item.id);
      setMessage({ tone: 'success', text: action === 'archive' ? `Archived ${item.name}. Recipes that use it keep it; tick “Show archived entries” to restore it.` : `Restored ${item.name}.` });
    } catch (error) {
      setMessage({ tone: 'error', text: error instanceof ApiError ? error.message : 'The change was not saved.' });
    }
  };
  const entry = editing.mode === 'edit' ? ((list.data?.items.find((i) => i.id === editing.id) ?? null) as MaterialViews[K] | null) : null;

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <label className="inline-flex items-center gap-2 text-sm">
          <input type="checkbox" className="h-4 w-4 accent-fjord-500" checked={showArchived} onChange={(event) => setShowArchived(event.target.checked)} />
          Show archived entries
        </label>
        {canWrite && editing.mode === 'closed' && (
          <Button
            onClick={() => {
              setMessage(null);
              setEditing({ mode: 'new' });
            }}
          >
            Add a {spec.singular}
          </Button>
        )}
      </div>
      {message && <Notice tone={message.tone}>{message.text}</Notice>}
      {canWrite && editing.mode !== 'closed' && (editing.mode === 'new' || entry) && (
        <Card title={entry ? `Edit ${entry.name}` : `Add a ${spec.singular}`}>
          <MaterialForm
            key={entry?.id ?? 'new'}
            kind={kind}
            entry={entry}
            onCancel={() => setEditing({ mode: 'closed' })}
            onSaved={(item) => {
              setEditing({ mode: 'closed' });
              setMessage({ tone: 'success', text: `Saved ${item.name}.` });
            }}
          />
        </Card>
      )}
      {list.isPending ? (
        <Loading label={`Loading ${spec.tab.toLowerCase()}…`} />
      ) : list.isError ? (
        <ErrorState error={list.error} retry={() => list.refetch()} />
      ) : list.data.items.length === 0 ? (
        <EmptyState title={`No ${spec.tab.toLowerCase()} in the library yet`}>{canWrite ? `Add the first ${spec.singular} with the button above.` : 'A formulator or manager adds them.'}</EmptyState>
      ) : (
        <MaterialTable
          kind={kind}
          items={list.data.items as MaterialViews[K][]}
          canWrite={canWrite}
          busyId={busyId}
          onEdit={(item) => {
            setMessage(null);
            setEditing({ mode: 'edit', id: item.id });
          }}
          onArchive={(item) => act(item, 'archive')}
          onRestore={(item) => act(item, 'restore')}
        />
      )}
    </div>
  );
}
