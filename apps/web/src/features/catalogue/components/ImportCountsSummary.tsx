import { Text } from '@fluentui/react-components';
import type { ImportCounts } from '../api/price-list-schemas';

export function ImportCountsSummary({ counts }: { counts: ImportCounts }) {
  return (
    <Text as="p" aria-live="polite">
      {counts.new} new · {counts.updated} updated · {counts.unchanged} unchanged · {counts.errors}{' '}
      {counts.errors === 1 ? 'row with errors' : 'rows with errors'}
    </Text>
  );
}
