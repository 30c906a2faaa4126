import { FluentProvider } from '@fluentui/react-components';
import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { linesmithLightTheme } from '../../../app/theme';
import { SafetyNote } from './SafetyNote';

// Expected wording: the product brief's "Safety" section (common practice for fluid-line work).
describe('safety note', () => {
  it('lists the usual cautions and puts codes, sanctioning-body rules and makers first', () => {
    render(
      <FluentProvider theme={linesmithLightTheme}>
        <SafetyNote />
      </FluentProvider>,
    );
    const items = within(screen.getByRole('list')).getAllByRole('listitem').map((li) => li.textContent);
    expect(items).toHaveLength(4);
    expect(items.join(' ')).toMatch(/relieve the pressure/i);
    expect(items.join(' ')).toMatch(/fuel or oil lines near an exhaust.*without shielding/i);
    expect(items.join(' ')).toMatch(/rated for the fluid, the maximum pressure and the maximum temperature/i);
    expect(items.join(' ')).toMatch(/leak test/i);
    expect(
      screen.getByText(/Local codes, sanctioning-body rules and the component makers' instructions take precedence/),
    ).toBeInTheDocument();
    expect(screen.queryByText(/Brake lines/)).not.toBeInTheDocument();
  });

  it('adds the brake-line warning on request', () => {
    render(
      <FluentProvider theme={linesmithLightTheme}>
        <SafetyNote showBrakeWarning />
      </FluentProvider>,
    );
    expect(screen.getByText(/Brake lines are outside what Linesmith plans/)).toBeInTheDocument();
  });
});
