import { Button, Field, makeStyles, Select, Text, tokens } from '@fluentui/react-components';
import { mountGroupSchema, unitKindSchema, type CircuitUnit, type MountGroup, type UnitKind } from '@linesmith/routing';
import { useEditor } from '../../hooks/editor-context';
import { addPort } from '../../model/commands/add-port';
import { deleteUnit } from '../../model/commands/delete-unit';
import { rotateUnit } from '../../model/commands/rotate-unit';
import { updateUnit } from '../../model/commands/update-unit';
import { CommitInput } from './CommitInput';
import { PortEditor } from './PortEditor';

export interface UnitInspectorProps {
  unit: CircuitUnit;
  highlightedPortId: string | null;
}

const useStyles = makeStyles({ stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalS } });

export function UnitInspector({ unit, highlightedPortId }: UnitInspectorProps) {
  const styles = useStyles();
  const { store } = useEditor();
  const unitId = unit.id;
  return (
    <div className={styles.stack}>
      <Text weight="semibold">Unit</Text>
      <Field label="Name" size="small">
        <CommitInput size="small" value={unit.label} onCommit={(label) => store.run(updateUnit, { unitId, changes: { label } })} />
      </Field>
      <Field label="Kind" size="small">
        <Select size="small" value={unit.kind} onChange={(_, d) => store.run(updateUnit, { unitId, changes: { kind: d.value as UnitKind } })}>
          {unitKindSchema.options.map((k) => (
            <option key={k} value={k}>
              {k}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Mount group" size="small" hint="Lines between different mount groups need slack.">
        <Select
          size="small"
          value={unit.mountGroup}
          onChange={(_, d) => store.run(updateUnit, { unitId, changes: { mountGroup: d.value as MountGroup } })}
        >
          {mountGroupSchema.options.map((g) => (
            <option key={g} value={g}>
              {g}
            </option>
          ))}
        </Select>
      </Field>
      <Field label="Rotation (degrees clockwise)" size="small">
        <CommitInput
          size="small"
          type="number"
          value={String(unit.rotation)}
          onCommit={(text) => {
            const degrees = Number(text);
            if (!Number.isFinite(degrees)) return 'Type a number of degrees';
            store.run(rotateUnit, { unitId, rotation: degrees });
          }}
        />
      </Field>
      {unit.kind === 'valve' && (
        <Field label="Valve kind" size="small" hint="e.g. thermostatic-bypass">
          <CommitInput size="small" value={unit.valveKind ?? ''} onCommit={(valveKind) => store.run(updateUnit, { unitId, changes: { valveKind: valveKind.trim() || undefined } })} />
        </Field>
      )}
      <Text weight="semibold">Ports ({unit.ports.length})</Text>
      {unit.ports.map((port) => (
        <PortEditor key={port.id} unitId={unitId} port={port} highlighted={port.id === highlightedPortId} />
      ))}
      <Button size="small" onClick={() => store.run(addPort, { unitId })}>
        Add port
      </Button>
      <Button size="small" appearance="subtle" onClick={() => store.run(deleteUnit, { unitId })}>
        Delete unit
      </Button>
    </div>
  );
}
