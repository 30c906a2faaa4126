import { Table, TableBody, TableCell, TableHeader, TableHeaderCell, TableRow } from '@fluentui/react-components';
import { formatCutLength, formatLength, type CircuitDocument, type CircuitEvaluation } from '@linesmith/routing';
import { lineName } from '../utils/flag-place';
import { partNames } from '../utils/part-names';

export interface CutListSummaryProps {
  document: CircuitDocument;
  evaluation: CircuitEvaluation;
}

/** Per line: hose and cut length in fractional inches and mm, so the reviewer sees what will be cut. */
export function CutListSummary({ document, evaluation }: CutListSummaryProps) {
  const names = partNames(evaluation.bom);
  return (
    <Table size="extra-small" aria-label="Cut list summary">
      <TableHeader>
        <TableRow>
          <TableHeaderCell>Line</TableHeaderCell>
          <TableHeaderCell>Hose</TableHeaderCell>
          <TableHeaderCell>Cut length</TableHeaderCell>
          <TableHeaderCell>Supports</TableHeaderCell>
          <TableHeaderCell>Sleeve</TableHeaderCell>
        </TableRow>
      </TableHeader>
      <TableBody>
        {evaluation.lines.map((report) => (
          <TableRow key={report.lineId}>
            <TableCell>{lineName(document, report.lineId)}</TableCell>
            <TableCell>{report.hosePartId ? (names.get(report.hosePartId) ?? report.hosePartId) : 'No hose picked'}</TableCell>
            <TableCell>
              {report.cutLengthIn === null
                ? 'Not worked out'
                : `${formatCutLength(report.cutLengthIn, 'in')} (${formatCutLength(report.cutLengthIn, 'mm')})`}
            </TableCell>
            <TableCell>{report.supports.atIn.length}</TableCell>
            <TableCell>{report.sleeves.plannedLengthIn > 0 ? formatLength(report.sleeves.plannedLengthIn, 'in') : '—'}</TableCell>
          </TableRow>
        ))}
      </TableBody>
    </Table>
  );
}
