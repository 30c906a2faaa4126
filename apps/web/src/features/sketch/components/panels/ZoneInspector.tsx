import { Button, Checkbox, Field, makeStyles, Select, Text, tokens } from '@fluentui/react-components';
import { heatZoneKindSchema, type HeatZone, type HeatZoneKind } from '@linesmith/routing';
import { useState } from 'react';
import { useEditor } from '../../hooks/editor-context';
import { deleteHeatZone } from '../../model/commands/delete-heat-zone';
import { updateHeatZone } from '../../model/commands/update-heat-zone';
import { CommitInput } from './CommitInput';
import { lengthFieldText, parseLength } from './length-input';

const useStyles = makeStyles({ stack: { display: 'grid', gridTemplateColumns: 'minmax(0, 1fr)', gap: tokens.spacingVerticalS } });

export function ZoneInspector({ zone }: { zone: HeatZone }) {
  const styles = useStyles();
  const { store, lengthUnit, shopRules } = useEditor();
  const [error, setError] = useState<string | null>(null);
  const zoneId = zone.id;
  const shopClearance = shopRules.heatClearanceIn[zone.kind];
  return (
    <div className={styles.stack}>
      <Text weight="semibold">Heat zone</Text>
      <Field label="Name" size="small">
        <CommitInput size="small" value={zone.label} onCommit={(label) => store.run(updateHeatZone, { zoneId, changes: { label } })} />
      </Field>
      <Field label="Kind" size="small">
        <Select size="small" value={zone.kind} onChange={(_, d) => store.run(updateHeatZone, { zoneId, changes: { kind: d.value as HeatZoneKind } })}>
          {heatZoneKindSchema.options.map((k) => (
            <option key={k} value={k}>
              {k}
            </option>
          ))}
        </Select>
      </Field>
      <Field
        label={`Clearance (${lengthUnit === 'mm' ? 'mm' : 'in'})`}
        size="small"
        hint={`Empty uses the shop's ${lengthFieldText(shopClearance, lengthUnit)} for ${zone.kind} (common practice).`}
        validationMessage={error ?? undefined}
      >
        <CommitInput
          size="small"
          value={lengthFieldText(zone.clearanceIn, lengthUnit)}
          onError={setError}
          onCommit={(text) => {
            try {
              store.run(updateHeatZone, { zoneId, changes: { clearanceIn: text.trim() ? parseLength(text, lengthUnit) : null } });
            } catch (e) {
              return e instanceof Error ? e.message : String(e);
            }
          }}
        />
      </Field>
      <Checkbox
        label="Shielded: a heat shield stands between this hot part and the lines"
        checked={!!zone.shielded}
        onChange={(_, d) => store.run(updateHeatZone, { zoneId, changes: { shielded: d.checked === true } })}
      />
      <Text size={200}>
        {zone.shielded
          ? 'A line touching this zone is a caution the reviewer must acknowledge; the stretch within the clearance still needs a fire sleeve.'
          : 'A line touching this zone is a blocker. Never route fuel or oil across exhaust without shielding.'}
      </Text>
      <Button size="small" appearance="subtle" onClick={() => store.run(deleteHeatZone, { zoneId })}>
        Delete heat zone
      </Button>
    </div>
  );
}
