import { Button, Checkbox, Field, makeStyles, Select, tokens } from '@fluentui/react-components';
import { changeConnection, families, familyLabel, listSizes, seatFormsOf, seatOf, type Family, type Gender, type SeatForm } from '@linesmith/catalog';
import { portRoleSchema, type CircuitPort, type PortRole } from '@linesmith/routing';
import { useEditor } from '../../hooks/editor-context';
import { deletePort } from '../../model/commands/delete-port';
import { setConnectionSpec } from '../../model/commands/set-connection-spec';
import { updatePort } from '../../model/commands/update-port';
import { CommitInput } from './CommitInput';
import { lengthFieldText, parseLength } from './length-input';

export interface PortEditorProps {
  unitId: string;
  port: CircuitPort;
  highlighted: boolean;
}

/** Which way fluid goes through each role, as the flow-direction check reads it. */
const ROLE_WORDS: Readonly<Record<PortRole, string>> = {
  out: 'out (outlet)',
  in: 'in (inlet)',
  return: 'return (fluid comes back in)',
  feed: 'feed (supplies another unit)',
  drain: 'drain (outlet)',
  vent: 'vent (breathes air)',
};

const useStyles = makeStyles({
  box: { border: `1px solid ${tokens.colorNeutralStroke2}`, borderRadius: tokens.borderRadiusMedium, padding: tokens.spacingVerticalXS, display: 'grid', gap: tokens.spacingVerticalXXS },
  highlighted: { border: `2px solid ${tokens.colorBrandStroke1}` },
  row: { display: 'grid', gridTemplateColumns: '1fr 1fr 1fr', gap: tokens.spacingHorizontalXS },
});

/** One port: connection family, size (from the standard's table), gender, role, requirement and lubrication. */
export function PortEditor({ unitId, port, highlighted }: PortEditorProps) {
  const styles = useStyles();
  const { store } = useEditor();
  const ref = { unitId, portId: port.id };
  // A new family keeps the size only where that family (and seat form) has it.
  const setSpec = (change: Partial<CircuitPort['connection']>) =>
    store.run(setConnectionSpec, { ...ref, connection: changeConnection(port.connection, change) });
  const seats = seatFormsOf(port.connection.family);
  const name = port.label || 'port';
  return (
    <fieldset className={`${styles.box} ${highlighted ? styles.highlighted : ''}`} aria-label={`Port ${name}`}>
      <Field label="Port name" size="small">
        <CommitInput size="small" value={port.label} onCommit={(label) => store.run(updatePort, { ...ref, changes: { label } })} />
      </Field>
      <div className={styles.row}>
        <Field label="Connection" size="small">
          <Select size="small" value={port.connection.family} onChange={(_, d) => setSpec({ family: d.value as Family })}>
            {families.map((f) => (
              <option key={f} value={f}>
                {familyLabel(f)}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Size" size="small">
          <Select size="small" value={port.connection.size} onChange={(_, d) => setSpec({ size: d.value })}>
            {listSizes(port.connection.family, seatOf(port.connection)).map((size) => (
              <option key={size} value={size}>
                {size}
              </option>
            ))}
          </Select>
        </Field>
        <Field label="Gender" size="small">
          <Select size="small" value={port.connection.gender} onChange={(_, d) => setSpec({ gender: d.value as Gender })}>
            <option value="female">female</option>
            <option value="male">male</option>
          </Select>
        </Field>
      </div>
      {seats.length > 0 && (
        <Field label="Seat form" size="small" hint="How the port seals: the thread alone does not say.">
          <Select size="small" value={seatOf(port.connection)} onChange={(_, d) => setSpec({ seat: d.value as SeatForm })}>
            {seats.map((s) => (
              <option key={s.seat} value={s.seat}>
                {s.label}
              </option>
            ))}
          </Select>
        </Field>
      )}
      <Field label="Role" size="small">
        <Select size="small" value={port.role} onChange={(_, d) => store.run(updatePort, { ...ref, changes: { role: d.value as PortRole } })}>
          {portRoleSchema.options.map((r) => (
            <option key={r} value={r}>
              {ROLE_WORDS[r]}
            </option>
          ))}
        </Select>
      </Field>
      <Checkbox
        label="Feeds lubrication (fluid leaving here lubricates a gear train or bearings)"
        checked={!!port.feedsLubrication}
        onChange={(_, d) => store.run(updatePort, { ...ref, changes: { feedsLubrication: d.checked === true } })}
      />
      <div className={styles.row}>
        <Field label="Requirement (feature)" size="small" hint="e.g. long-nose">
          <CommitInput
            size="small"
            value={port.requirement?.feature ?? ''}
            onCommit={(feature) =>
              store.run(updatePort, {
                ...ref,
                changes: {
                  requirement: feature.trim()
                    ? { feature: feature.trim(), reason: port.requirement?.reason ?? 'the unit maker asks for it' }
                    : null,
                },
              })
            }
          />
        </Field>
        <Field label="Reason" size="small" style={{ gridColumn: 'span 2' }}>
          <CommitInput
            size="small"
            disabled={!port.requirement}
            value={port.requirement?.reason ?? ''}
            onCommit={(reason) =>
              port.requirement && reason.trim()
                ? store.run(updatePort, { ...ref, changes: { requirement: { feature: port.requirement.feature, reason: reason.trim() } } })
                : 'A reason is required'
            }
          />
        </Field>
      </div>
      <div className={styles.row}>
        {(
          [
            ['threadDepthIn', 'Thread depth (in)', 'Usable full thread from the face; a longer reach bottoms.'],
            ['passageDepthIn', 'Passage at (in)', 'Depth of an internal passage behind the port; a fitting reaching it blocks it.'],
            ['minReachIn', 'Least reach (in)', 'Reach the port needs, e.g. a long nose into the lubrication passage.'],
          ] as const
        ).map(([key, label, hint]) => (
          <Field key={key} label={label} size="small" hint={hint}>
            <CommitInput
              size="small"
              value={lengthFieldText(port[key], 'in')}
              onCommit={(text) => {
                try {
                  store.run(updatePort, { ...ref, changes: { [key]: text.trim() ? parseLength(text, 'in') : null } });
                } catch (e) {
                  return e instanceof Error ? e.message : String(e);
                }
              }}
            />
          </Field>
        ))}
      </div>
      <Button size="small" appearance="subtle" onClick={() => store.run(deletePort, ref)}>
        Delete port {name}
      </Button>
    </fieldset>
  );
}
