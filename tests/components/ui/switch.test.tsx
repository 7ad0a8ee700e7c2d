import { renderWithProviders } from '../../utils/render';
import { keyDown } from '../../utils/keys';

import { fireEvent, screen } from '@testing-library/react-native';
import { useState } from 'react';

import { Switch } from '@/components/ui/switch';

function Harness({ initial = false, disabled = false }: { initial?: boolean; disabled?: boolean }) {
  const [on, setOn] = useState(initial);
  return <Switch label="Send on 40 m" hint="Off keeps the band's settings" value={on} onChange={setOn} disabled={disabled} />;
}

const control = () => screen.getByLabelText('Send on 40 m');

describe('Switch', () => {
  it('is a switch with aria-checked that follows its state', () => {
    renderWithProviders(<Harness />);
    expect(control().props.role).toBe('switch');
    expect(control().props['aria-checked']).toBe(false);
    fireEvent.press(control());
    expect(control().props['aria-checked']).toBe(true);
  });

  it('flips with Space and with Enter, once per key, and keeps Space from scrolling the page', () => {
    renderWithProviders(<Harness />);
    const space = keyDown(' ');
    fireEvent(control(), 'keyDown', space.event);
    expect(control().props['aria-checked']).toBe(true);
    expect(space.prevented()).toBe(true);
    fireEvent(control(), 'keyDown', keyDown('Enter').event);
    expect(control().props['aria-checked']).toBe(false);
    fireEvent(control(), 'keyDown', keyDown('a').event);
    expect(control().props['aria-checked']).toBe(false);
    // react-native-web also reports Enter's key-up as a press: that one must not flip it back
    fireEvent.press(control(), { key: 'Enter', type: 'keyup' });
    expect(control().props['aria-checked']).toBe(false);
  });

  it('when disabled, says so and does not flip', () => {
    renderWithProviders(<Harness initial disabled />);
    expect(control().props['aria-disabled']).toBe(true);
    fireEvent(control(), 'keyDown', keyDown(' ').event);
    fireEvent.press(control());
    expect(control().props['aria-checked']).toBe(true);
  });
});
