import { IMPORT_COLUMNS } from '@shared/schemas/observations';

/** A header-only CSV in our column names, built in the page: nothing to fetch, always in step with the importer. */
const TEMPLATE_HREF = `data:text/csv;charset=utf-8,${encodeURIComponent(`${IMPORT_COLUMNS.join(',')}\r\n`)}`;

export function CsvTemplateLink() {
  return (
    <a href={TEMPLATE_HREF} download="gelwright-bench-import-template.csv" className="text-sm font-medium">
      Download the CSV template
    </a>
  );
}
