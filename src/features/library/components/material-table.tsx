import type { MaterialKind } from '@shared/schemas/materials';
import type { MaterialViews } from '@shared/views/materials';
import { Button } from '@/components/ui/button';
import { Badge } from '@/components/ui/page';
import { Table, Td, Th } from '@/components/ui/table';
import { formatNumber } from '@/lib/format';
import { KIND_SPECS, type MaterialField } from './material-fields';

function cellText(field: MaterialField, value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (field.type === 'select') return field.options?.find((o) => o.value === value)?.label ?? String(value);
  if (typeof value === 'number') return formatNumber(value, 4);
  return String(value);
}

/** A column head kept in its own case: upper-casing would turn nm into NM and mPa·s into MPA·S. */
function UnitTh({ children }: { children: string }) {
  return (
    <th scope="col" className="border-b border-line bg-paper px-3 py-2 text-left text-xs font-semibold text-ink-soft">
      {children}
    </th>
  );
}

/** One kind's entries; the action column appears only for roles that may edit the library. */
export function MaterialTable<K extends MaterialKind>({
  kind,
  items,
  canWrite,
  busyId,
  onEdit,
  onArchive,
  onRestore,
}: {
  kind: K;
  items: MaterialViews[K][];
  canWrite: boolean;
  busyId: number | null;
  onEdit: (item: MaterialViews[K]) => void;
  onArchive: (item: MaterialViews[K]) => void;
  onRestore: (item: MaterialViews[K]) => void;
}) {
  const spec = KIND_SPECS[kind];
  const columns = spec.fields.filter((f) => f.inTable);
  return (
    <Table caption={`${spec.tab} in the library`}>
      <thead>
        <tr>
          {columns.map((field) => (
            <UnitTh key={field.name}>{field.label}</UnitTh>
          ))}
          {canWrite && (
            <Th>
              <span className="sr-only">Actions</span>
            </Th>
          )}
        </tr>
      </thead>
      <tbody>
        {items.map((item) => {
          const record = item as unknown as Record<string, unknown>;
          return (
            <tr key={item.id} className={item.archived ? 'text-ink-soft' : ''}>
              {columns.map((field, index) => (
                <Td key={field.name} className={index === 0 ? 'font-medium' : field.type === 'number' ? 'tabular-nums' : ''}>
                  {cellText(field, record[field.name])}
                  {index === 0 && item.archived && (
                    <span className="ml-2">
                      <Badge>Archived</Badge>
                    </span>
                  )}
                </Td>
              ))}
              {canWrite && (
                <Td className="whitespace-nowrap text-right">
                  <Button variant="quiet" size="sm" aria-label={`Edit ${item.name}`} onClick={() => onEdit(item)}>
                    Edit
                  </Button>
                  {item.archived ? (
                    <Button variant="quiet" size="sm" aria-label={`Restore ${item.name}`} busy={busyId === item.id} onClick={() => onRestore(item)}>
                      Restore
                    </Button>
                  ) : (
                    <Button variant="quiet" size="sm" aria-label={`Archive ${item.name}`} busy={busyId === item.id} onClick={() => onArchive(item)}>
                      Archive
                    </Button>
                  )}
                </Td>
              )}
            </tr>
          );
        })}
      </tbody>
    </Table>
  );
}
