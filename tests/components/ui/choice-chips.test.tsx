import { renderWithProviders } from '../../utils/render';
import { keyDown } from '../../utils/keys';

import { fireEvent, screen } from '@testing-library/react-native';
import { useState } from 'react';

import { ChoiceChips, MultiChoiceChips } from '@/components/ui/choice-chips';

const bands = [
  { value: '40m', label: '40 m' },
  { value: '30m', label: '30 m', disabled: true },
  { value: '20m', label: '20 m' },
  { value: '10m', label: '10 m' },
] as const;
type Band = (typeof bands)[number]['value'];

function Single({ onChange }: { onChange?: (value: Band) => void }) {
  const [value, setValue] = useState<Band | null>('40m');
  return (
    <ChoiceChips<Band>
      label="Band"
      options={bands}
      value={value}
      onChange={(next) => {
        setValue(next);
        onChange?.(next);
      }}
    />
  );
}

function Multi() {
  const [value, setValue] = useState<Band[]>(['20m']);
  return <MultiChoiceChips<Band> label="Bands the filter serves" options={bands} value={value} onChange={setValue} />;
}

const chip = (label: string) => screen.getByLabelText(label);
const checked = () => bands.map((b) => chip(b.label).props['aria-checked']);
const tabStops = () => bands.map((b) => chip(b.label).props.tabIndex);

describe('ChoiceChips (one choice)', () => {
  it('is a labelled radiogroup of radios with aria-checked on the chosen one', () => {
    renderWithProviders(<Single />);
    const group = screen.getByLabelText('Band');
    expect(group.props.role).toBe('radiogroup');
    expect(bands.map((b) => chip(b.label).props.role)).toEqual(['radio', 'radio', 'radio', 'radio']);
    expect(checked()).toEqual([true, false, false, false]);
    expect(chip('30 m').props['aria-disabled']).toBe(true);
  });

  it('is one Tab stop: only the chosen chip is in the tab order', () => {
    renderWithProviders(<Single />);
    expect(tabStops()).toEqual([0, -1, -1, -1]);
    fireEvent.press(chip('20 m'));
    expect(tabStops()).toEqual([-1, -1, 0, -1]);
  });

  it('moves the choice with the arrow keys, skipping a disabled chip and wrapping at the ends', () => {
    const onChange = jest.fn();
    renderWithProviders(<Single onChange={onChange} />);
    const right = keyDown('ArrowRight');
    fireEvent(chip('40 m'), 'keyDown', right.event);
    expect(right.prevented()).toBe(true); // the page does not scroll
    expect(checked()).toEqual([false, false, true, false]); // 30 m is disabled: skipped
    fireEvent(chip('20 m'), 'keyDown', keyDown('ArrowDown').event);
    expect(checked()).toEqual([false, false, false, true]);
    fireEvent(chip('10 m'), 'keyDown', keyDown('ArrowRight').event);
    expect(checked()).toEqual([true, false, false, false]);
    fireEvent(chip('40 m'), 'keyDown', keyDown('ArrowLeft').event);
    expect(checked()).toEqual([false, false, false, true]);
    fireEvent(chip('10 m'), 'keyDown', keyDown('Home').event);
    expect(checked()).toEqual([true, false, false, false]);
    expect(onChange.mock.calls.map(([value]) => value)).toEqual(['20m', '10m', '40m', '10m', '40m']);
    expect(tabStops()).toEqual([0, -1, -1, -1]);
  });

  it('chooses with Space and with Enter; a disabled chip cannot be chosen', () => {
    renderWithProviders(<Single />);
    fireEvent(chip('20 m'), 'keyDown', keyDown(' ').event);
    expect(checked()).toEqual([false, false, true, false]);
    fireEvent(chip('10 m'), 'keyDown', keyDown('Enter').event);
    expect(checked()).toEqual([false, false, false, true]);
    fireEvent(chip('30 m'), 'keyDown', keyDown(' ').event);
    fireEvent.press(chip('30 m'));
    expect(checked()).toEqual([false, false, false, true]);
  });
});

describe('MultiChoiceChips (any number)', () => {
  it('is a labelled group of checkboxes with aria-checked on each chosen one', () => {
    renderWithProviders(<Multi />);
    expect(screen.getByLabelText('Bands the filter serves').props.role).toBe('group');
    expect(bands.map((b) => chip(b.label).props.role)).toEqual(['checkbox', 'checkbox', 'checkbox', 'checkbox']);
    expect(checked()).toEqual([false, false, true, false]);
  });

  it('toggles with Space and Enter; the arrow keys move focus without changing the choice', () => {
    renderWithProviders(<Multi />);
    expect(tabStops()).toEqual([-1, -1, 0, -1]); // the first chosen chip holds the Tab stop
    fireEvent(chip('20 m'), 'keyDown', keyDown('ArrowLeft').event);
    expect(tabStops()).toEqual([0, -1, -1, -1]);
    expect(checked()).toEqual([false, false, true, false]);
    fireEvent(chip('40 m'), 'keyDown', keyDown(' ').event);
    expect(checked()).toEqual([true, false, true, false]);
    fireEvent(chip('20 m'), 'keyDown', keyDown('Enter').event);
    expect(checked()).toEqual([true, false, false, false]);
    fireEvent(chip('40 m'), 'keyDown', keyDown('End').event);
    expect(tabStops()).toEqual([-1, -1, -1, 0]);
  });
});
