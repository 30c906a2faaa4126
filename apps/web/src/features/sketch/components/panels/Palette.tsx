import { Button, makeStyles, Text, tokens } from '@fluentui/react-components';
import type { UnitKind } from '@linesmith/routing';
import { unitPresets } from '../../model/unit-presets';

export interface PaletteProps {
  onAdd(kind: UnitKind): void;
}

const useStyles = makeStyles({
  grid: { display: 'grid', gridTemplateColumns: '1fr 1fr', gap: tokens.spacingVerticalXS },
});

/** Units to place: each starts with the usual ports for its kind, edited in the inspector. */
export function Palette({ onAdd }: PaletteProps) {
  const styles = useStyles();
  return (
    <section aria-labelledby="sketch-palette-title">
      <Text as="h2" id="sketch-palette-title" weight="semibold" size={300}>
        Units
      </Text>
      <div className={styles.grid}>
        {Object.values(unitPresets).map((preset) => (
          <Button key={preset.kind} size="small" onClick={() => onAdd(preset.kind)} aria-label={`Place ${preset.label.toLowerCase()}`}>
            {preset.label}
          </Button>
        ))}
      </div>
    </section>
  );
}
