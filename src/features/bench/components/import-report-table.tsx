import type { ImportRowProblem } from '@shared/views/observation';
import { Table, Td, Th } from '@/components/ui/table';

/** Every problem the check found, by row (the header is row 1, as in a spreadsheet) and column. */
export function ImportReportTable({ problems }: { problems: ImportRowProblem[] }) {
  return (
    <Table caption="Problems found in the file">
      <thead>
        <tr>
          <Th className="w-20 text-right">Row</Th>
          <Th className="w-48">Column</Th>
          <Th>Problem</Th>
        </tr>
      </thead>
      <tbody>
        {problems.map((p, index) => (
          <tr key={`${p.row}-${p.column}-${index}`}>
            <Td className="text-right tabular-nums">{p.row}</Td>
            <Td>{p.column ? <code className="text-xs">{p.column}</code> : <span className="text-ink-soft">whole file</span>}</Td>
            <Td>{p.message}</Td>
          </tr>
        ))}
      </tbody>
    </Table>
  );
}
