import { makeStyles, Text, tokens } from '@fluentui/react-components';
import type { Fluid } from '@linesmith/catalog';
import { fluidClassStyles, fluidStyle } from '../../utils/fluid-colours';

const useStyles = makeStyles({
  list: { display: 'flex', flexWrap: 'wrap', gap: tokens.spacingHorizontalS, margin: 0, padding: 0, listStyle: 'none' },
  chip: { padding: '1px 6px', borderRadius: tokens.borderRadiusSmall, fontSize: tokens.fontSizeBase200, border: `1px solid ${tokens.colorNeutralStroke1}` },
  current: { outline: `2px solid ${tokens.colorBrandStroke1}` },
});

/** Legend of the line colours (fluid classes after ASME A13.1); the circuit's own class is outlined. */
export function FluidLegend({ fluid }: { fluid: Fluid }) {
  const styles = useStyles();
  const current = fluidStyle(fluid).fluidClass;
  return (
    <div aria-label="Line colours">
      <Text size={200}>Line colours (ASME A13.1 fluid classes); dashed = no hose picked yet:</Text>
      <ul className={styles.list}>
        {Object.values(fluidClassStyles).map((s) => (
          <li
            key={s.fluidClass}
            className={`${styles.chip} ${s.fluidClass === current ? styles.current : ''}`}
            style={{ background: s.stroke, color: s.text }}
          >
            {s.label}
            {s.fluidClass === current ? ' — this circuit' : ''}
          </li>
        ))}
      </ul>
    </div>
  );
}
