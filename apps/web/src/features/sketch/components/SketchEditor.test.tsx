import { FluentProvider, webLightTheme } from '@fluentui/react-components';
import { demoParts } from '@linesmith/catalog';
import { defaultShopRules, evaluateCircuit, formatCutLength } from '@linesmith/routing';
import { render, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { describe, expect, it } from 'vitest';
import { createEditorStore } from '../model/editor-store';
import { coolerSketch } from '../test-support/sketch-fixtures';
import { SketchEditor } from './SketchEditor';

function renderEditor() {
  const store = createEditorStore(coolerSketch(), [{ kind: 'line', id: 'return-line' }]);
  const utils = render(
    <FluentProvider theme={webLightTheme}>
      <SketchEditor store={store} parts={demoParts} shopRules={defaultShopRules} lengthUnit="in" />
    </FluentProvider>,
  );
  return { store, ...utils };
}

const flagCodes = () =>
  Array.from(document.querySelectorAll('[data-flag-code]')).map((el) => el.getAttribute('data-flag-code'));

describe('SketchEditor', () => {
  it('flags a short fitting in a lubrication-feeding port and clears it with the long-nose suggestion', async () => {
    const user = userEvent.setup();
    const { store } = renderEditor();
    const flags = screen.getByRole('region', { name: /flags/i });
    await waitFor(() => expect(flagCodes()).toContain('port-requirement'));
    expect(within(flags).getByText(/needs a long-nose fitting/i)).toBeInTheDocument();

    const fromEnd = screen.getByRole('region', { name: /end stack at transmission cooler return/i });
    const useLongNose = within(fromEnd).getByRole('button', { name: /use .*long-nose/i });
    await user.click(useLongNose);

    expect(store.getState().history.doc.lines[0].endStacks.from).toEqual(['demo-adapter-orb6-f37-6-long', 'demo-hose-end-6-rubber-0']);
    await waitFor(() => expect(flagCodes()).not.toContain('port-requirement'));
    // One click, one undo step: undo brings the flag back.
    store.undo();
    await waitFor(() => expect(flagCodes()).toContain('port-requirement'));
  });

  it('shows the cut length the routing lib works out for the line', async () => {
    renderEditor();
    const expected = evaluateCircuit(coolerSketch(), demoParts, defaultShopRules).lines[0].cutLengthIn!;
    const table = await screen.findByRole('table', { name: /cut length/i });
    const row = within(table).getByRole('row', { name: /cut length \(rounded up\)/i });
    expect(row).toHaveTextContent(formatCutLength(expected, 'in'));
  });
});
