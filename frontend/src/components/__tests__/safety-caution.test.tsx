import { render, screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { SafetyCaution } from '@/components/safety-caution';

describe('SafetyCaution', () => {
  it('names the danger, lists the points and always ends with the standing instruction', () => {
    render(<SafetyCaution title="Fuel vapour" points={['Work in a ventilated area.', 'No sparks or open flames near the fuel system.']} />);

    const note = screen.getByRole('note', { name: 'Safety: Fuel vapour' });
    expect(within(note).getAllByRole('listitem')).toHaveLength(2);
    expect(note).toHaveTextContent("Follow the vehicle maker's procedure, local regulations and licensed practice.");
  });
});
