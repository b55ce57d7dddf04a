import { EmptyState, ErrorState, Loading } from '@/components/ui/states';
import { observationExportUrl } from '../api/export-observations';
import { BENCH_PAGE_SIZE, useObservations } from '../api/get-observations';
import { useBenchFilters } from '../hooks/use-bench-filters';
import { BenchFilters } from './bench-filters';
import { LogPager } from './log-pager';
import { ObservationTable } from './observation-table';

/** The programme's bench log with its filters (kept in the URL), paging and CSV export of what is shown. */
export function BenchLog({ programmeId }: { programmeId: number }) {
  const { values, filters, page, change, setPage, clear } = useBenchFilters(programmeId);
  const log = useObservations(filters, page);
  const pages = log.data ? Math.max(1, Math.ceil(log.data.total / BENCH_PAGE_SIZE)) : 1;
  const filtered = Boolean(values.state || values.method || values.disagreeing || values.minAge || values.maxAge);
  return (
    <section aria-labelledby="bench-log-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h2 id="bench-log-heading">Observations</h2>
        <a href={observationExportUrl(filters)} download className="text-sm font-medium">
          Export these observations as CSV
        </a>
      </div>
      <BenchFilters values={values} onChange={change} onClear={clear} />
      {log.isPending ? (
        <Loading label="Loading the bench log…" />
      ) : log.isError ? (
        <ErrorState error={log.error} retry={() => log.refetch()} />
      ) : log.data.items.length === 0 ? (
        <EmptyState title={filtered ? 'No observation matches these filters' : 'Nothing recorded for this programme yet'}>
          {filtered ? 'Widen the filters, or clear them.' : 'Bench scientists record outcomes one by one or import a batch from CSV.'}
        </EmptyState>
      ) : (
        <>
          <ObservationTable items={log.data.items} />
          <LogPager page={page} pages={pages} total={log.data.total} onPage={setPage} />
        </>
      )}
    </section>
  );
}
