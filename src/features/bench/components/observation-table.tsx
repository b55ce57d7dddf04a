import { Link } from 'react-router-dom';
import { METHOD_LABELS } from '@shared/states';
import type { ObservationView } from '@shared/views/observation';
import { StateBadge } from '@/components/ui/state-badge';
import { Table, Td, Th } from '@/components/ui/table';
import { formatDate, formatNumber } from '@/lib/format';
import { attachmentUrl } from '../api/attachment-url';
import { AgreementMark } from './agreement-mark';

function measured(o: ObservationView): string[] {
  const parts: string[] = [];
  if (o.storageModulusPa !== null) parts.push(`G′ ${formatNumber(o.storageModulusPa)} Pa`);
  if (o.yieldStressPa !== null) parts.push(`yield ${formatNumber(o.yieldStressPa)} Pa`);
  if (o.settledHeightPct !== null) parts.push(`settled ${formatNumber(o.settledHeightPct)} %`);
  if (o.sampleHeightMm !== null) parts.push(`fill ${formatNumber(o.sampleHeightMm)} mm`);
  return parts;
}

/** The bench log, newest mixing date first. */
export function ObservationTable({ items }: { items: ObservationView[] }) {
  return (
    <Table caption="Bench log: observed outcomes, newest first">
      <thead>
        <tr>
          <Th>Mixed on, by</Th>
          <Th>Recipe</Th>
          <Th className="text-right">Age (days)</Th>
          <Th>Observed</Th>
          <Th>Predicted</Th>
          <Th>Agreement</Th>
          <Th>Method, measured</Th>
          <Th>Files</Th>
        </tr>
      </thead>
      <tbody>
        {items.map((o) => (
          <tr key={o.id} className={o.agrees === false ? 'bg-brick-50/40' : ''}>
            <Td>
              <span className="whitespace-nowrap">{formatDate(o.mixedAt)}</span>
              <span className="block text-xs text-ink-soft">{o.observer?.name ?? 'someone no longer listed'}</span>
            </Td>
            <Td className="max-w-48">
              {o.recipeCode ? (
                <Link to={`/recipes/${o.recipeCode}`} className="font-medium">
                  {o.recipeCode}
                </Link>
              ) : (
                <span>Ad-hoc{o.adhoc?.description ? `: ${o.adhoc.description}` : ''}</span>
              )}
              {o.notes && <p className="truncate text-xs text-ink-soft" title={o.notes}>{o.notes}</p>}
            </Td>
            <Td className="text-right tabular-nums">{formatNumber(o.ageDays)}</Td>
            <Td className="whitespace-nowrap">
              <StateBadge state={o.observedState} />
            </Td>
            <Td className="whitespace-nowrap">{o.predictedState ? <StateBadge state={o.predictedState} /> : <span className="text-xs text-ink-soft">No prediction</span>}</Td>
            <Td>
              <AgreementMark agrees={o.agrees} />
            </Td>
            <Td>
              <span className="whitespace-nowrap">{METHOD_LABELS[o.method]}</span>
              {measured(o).length > 0 && <span className="block whitespace-nowrap text-xs text-ink-soft">{measured(o).join(' · ')}</span>}
            </Td>
            <Td className="max-w-32 text-xs">
              {o.attachments.length === 0 ? (
                <span className="text-ink-soft">—</span>
              ) : (
                <ul>
                  {o.attachments.map((a) => (
                    <li key={a.id} className="truncate">
                      <a href={attachmentUrl(a)} download={a.originalName} title={a.originalName}>
                        {a.originalName}
                      </a>
                    </li>
                  ))}
                </ul>
              )}
            </Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
