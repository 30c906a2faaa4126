import { Button, Field, makeStyles, Select, Text, tokens } from '@fluentui/react-components';
import { bendRadiusCheck, formatLength, supportSpacingFor, type CircuitDocument, type CircuitLine } from '@linesmith/routing';
import { useMemo, useState } from 'react';
import { useEditor } from '../../hooks/editor-context';
import { deleteLine } from '../../model/commands/delete-line';
import { proposeSupports } from '../../model/commands/propose-supports';
import { removeCorner } from '../../model/commands/remove-corner';
import { removeSleeve } from '../../model/commands/remove-sleeve';
import { removeSupport } from '../../model/commands/remove-support';
import { setBendRadius } from '../../model/commands/set-bend-radius';
import { setHose } from '../../model/commands/set-hose';
import { setMeasuredLength } from '../../model/commands/set-measured-length';
import { sleeveRequiredSpans } from '../../model/commands/sleeve-required-spans';
import { hosesForCircuit } from '../../utils/part-filters';
import { CommitInput } from './CommitInput';
import { CutLengthReport } from './CutLengthReport';
import { EndStackEditor } from './EndStackEditor';
import { lengthFieldText, parseLength } from './length-input';

export interface LineInspectorProps {
  doc: CircuitDocument;
  line: CircuitLine;
  selectedCorner: number | null;
}

const useStyles = makeStyles({
  stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalS },
  list: { margin: 0, paddingLeft: tokens.spacingHorizontalL, fontSize: tokens.fontSizeBase200 },
  row: { display: 'flex', gap: tokens.spacingHorizontalXS, alignItems: 'center' },
  error: { color: tokens.colorPaletteRedForeground1 },
});

const errorText = (e: unknown) => (e instanceof Error ? e.message : String(e));

export function LineInspector({ doc, line, selectedCorner }: LineInspectorProps) {
  const styles = useStyles();
  const { store, parts, partsById, evaluation, lengthUnit, shopRules } = useEditor();
  const [error, setError] = useState<string | null>(null);
  const report = evaluation.lines.find((r) => r.lineId === line.id);
  const hoses = useMemo(() => hosesForCircuit(parts, doc.circuit), [parts, doc.circuit]);
  const hosePart = line.hosePartId ? partsById.get(line.hosePartId) : undefined;
  const hose = hosePart?.kind === 'hose' ? hosePart : undefined;
  const lineId = line.id;
  const endOf = (ref: CircuitLine['from']) => {
    const unit = doc.units.find((u) => u.id === ref.unitId);
    const port = unit?.ports.find((p) => p.id === ref.portId);
    return { port, name: `${unit?.label || 'unit'} ${port?.label || 'port'}` };
  };
  const from = endOf(line.from);
  const to = endOf(line.to);
  const len = (v: number) => formatLength(v, lengthUnit);
  const basisIn = report?.basis === 'measured' ? report.measuredLengthIn : report?.centrelineIn ?? null;
  const spacingIn = supportSpacingFor(hose?.attributes.dash, shopRules);

  return (
    <div className={styles.stack}>
      <Text weight="semibold">
        Line: {from.name} → {to.name}
      </Text>
      <Field
        label="Hose"
        size="small"
        hint={`Only hoses rated for ${doc.circuit.fluid}, ${doc.circuit.maxPressurePsi} psi and ${doc.circuit.maxTempF} °F are listed.`}
      >
        <Select size="small" value={line.hosePartId ?? ''} onChange={(_, d) => store.run(setHose, { lineId, hosePartId: d.value || null })}>
          <option value="">— choose a hose —</option>
          {line.hosePartId && !hoses.some((h) => h.id === line.hosePartId) && (
            <option value={line.hosePartId}>{hosePart?.description ?? line.hosePartId} (not rated for this circuit)</option>
          )}
          {hoses.map((h) => (
            <option key={h.id} value={h.id}>
              {h.description}
            </option>
          ))}
        </Select>
      </Field>
      <EndStackEditor line={line} end="from" port={from.port} portName={from.name} hose={hose} />
      <EndStackEditor line={line} end="to" port={to.port} portName={to.name} hose={hose} />
      <Field
        label={`Measured length (${lengthUnit === 'mm' ? 'mm' : 'in, fractions like 23 11/16'})`}
        size="small"
        hint="String or tape along the real path; overrides the drawn length. Empty uses the drawing."
        validationMessage={error ?? undefined}
      >
        <CommitInput
          size="small"
          value={lengthFieldText(line.measuredLengthIn, lengthUnit)}
          onError={setError}
          onCommit={(text) => {
            try {
              store.run(setMeasuredLength, { lineId, measuredLengthIn: text.trim() ? parseLength(text, lengthUnit) : null });
            } catch (e) {
              return errorText(e);
            }
          }}
        />
      </Field>
      {line.points.length > 0 && (
        <section aria-label="Corners">
          <Text weight="semibold" size={200}>
            Corners (bend radius, in)
          </Text>
          <ol className={styles.list}>
            {line.points.map((p, index) => (
              <li key={index} className={styles.row} style={{ fontWeight: index === selectedCorner ? 600 : undefined }}>
                <span>Corner {index + 1}</span>
                {hose && p.bendRadiusIn > 0 && (
                  <span title="Inside radius = centreline radius − half the hose OD">
                    inside {Number(bendRadiusCheck(p.bendRadiusIn, hose).insideIn.toFixed(3))} in
                  </span>
                )}
                <CommitInput
                  size="small"
                  aria-label={`Bend radius of corner ${index + 1}`}
                  value={lengthFieldText(p.bendRadiusIn, 'in')}
                  onCommit={(text) => {
                    try {
                      store.run(setBendRadius, { lineId, index, bendRadiusIn: parseLength(text, 'in') });
                    } catch (e) {
                      return errorText(e);
                    }
                  }}
                />
                <Button size="small" appearance="subtle" onClick={() => store.run(removeCorner, { lineId, index })}>
                  Remove
                </Button>
              </li>
            ))}
          </ol>
          {hose && (
            <Text size={200}>
              This hose bends no tighter than {hose.attributes.minBendRadiusIn} in radius, quoted by its maker to the{' '}
              {(hose.attributes.minBendRadiusMeasuredTo ?? 'inside') === 'inside' ? 'inside of the bend' : 'centreline'} (set per hose in the
              catalogue). Corner radii here are centreline radii.
            </Text>
          )}
        </section>
      )}
      <section aria-label="Supports">
        <Text weight="semibold" size={200}>
          Supports ({line.supports.length}) — shop spacing {len(spacingIn)}
          {hose && shopRules.supportSpacingByDashIn[String(hose.attributes.dash)] !== undefined ? ` for -${hose.attributes.dash}` : ''}
        </Text>
        <ul className={styles.list}>
          {line.supports.map((s) => (
            <li key={s.id} className={styles.row}>
              <span>at {len(s.atIn)} from {from.name}</span>
              <Button size="small" appearance="subtle" onClick={() => store.run(removeSupport, { lineId, supportId: s.id })}>
                Remove
              </Button>
            </li>
          ))}
        </ul>
        <Button
          size="small"
          disabled={basisIn === null}
          onClick={() => basisIn !== null && store.run(proposeSupports, { lineId, lengthIn: basisIn, spacingIn })}
        >
          Propose supports
        </Button>
      </section>
      <section aria-label="Sleeves">
        <Text weight="semibold" size={200}>
          Sleeves ({line.sleeves.length})
          {report && report.sleeves.requiredIn.length > 0 ? ` — heat needs ${len(report.sleeves.plannedLengthIn)} of sleeve` : ''}
        </Text>
        <ul className={styles.list}>
          {line.sleeves.map((s) => (
            <li key={s.id} className={styles.row}>
              <span>
                {len(s.startIn)} to {len(s.endIn)} ({len(s.endIn - s.startIn)})
              </span>
              <Button size="small" appearance="subtle" onClick={() => store.run(removeSleeve, { lineId, sleeveId: s.id })}>
                Remove
              </Button>
            </li>
          ))}
        </ul>
        <Button
          size="small"
          disabled={!report || report.sleeves.plannedIn.length === 0}
          onClick={() => report && store.run(sleeveRequiredSpans, { lineId, plannedIn: report.sleeves.plannedIn })}
        >
          Sleeve required spans
        </Button>
      </section>
      {report && <CutLengthReport report={report} unit={lengthUnit} />}
      <Button size="small" appearance="subtle" onClick={() => store.run(deleteLine, { lineId })}>
        Delete line
      </Button>
    </div>
  );
}
