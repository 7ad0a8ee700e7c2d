import { renderWithProviders, screenText } from '../../utils/render';

import { fireEvent, screen } from '@testing-library/react-native';

import { PadDesigner } from '@/components/units/pad-designer';

describe('PadDesigner', () => {
  it('when a 10 dBm generator drives a 20 dB amplifier for 23 dBm, asks for 6.5 dB and offers the 6 and 10 dB parts', () => {
    const onUse = jest.fn();
    renderWithProviders(<PadDesigner generatorDbm={10} amplifier={{ gainDb: 20, saturatedDbm: 33 }} filterLossDb={0.5} onUse={onUse} />);
    // 10 + 20 − 0.5 − 23 = 6.5 dB (the power chain's arithmetic)
    expect(screenText()).toContain('Needed: 6.5 dB for 23.0 dBm');
    // standard 50 Ω table (from memory) at 6.5 dB: pi shunt ≈ 140 Ω → E24 150 Ω
    expect(screenText()).toContain('140 Ω → E24 150 Ω');
    fireEvent.press(screen.getByLabelText('Use a 6 dB attenuator: 6 dB part → 23.5 dBm'));
    expect(onUse).toHaveBeenCalledWith(6);
  });

  it('when the wanted output is above the amplifier’s saturation, says a bigger amplifier is needed', () => {
    renderWithProviders(<PadDesigner generatorDbm={10} amplifier={{ gainDb: 20, saturatedDbm: 27 }} filterLossDb={0.5} />);
    fireEvent.changeText(screen.getByLabelText('Wanted output'), '30');
    expect(screenText()).toContain('needs a bigger amplifier');
  });

  it('when the wanted level is not a WSPR level, says which levels exist', () => {
    renderWithProviders(<PadDesigner generatorDbm={10} amplifier={null} filterLossDb={0.5} />);
    fireEvent.press(screen.getByLabelText('WSPR level'));
    fireEvent.changeText(screen.getByLabelText('Wanted output'), '5');
    expect(screenText()).toContain('5 dBm is not a WSPR level');
  });

  it('when the generator level is not known yet, asks for it', () => {
    renderWithProviders(<PadDesigner generatorDbm={undefined} amplifier={null} filterLossDb={0} />);
    expect(screenText()).toContain('Fill in the generator output to design an attenuator.');
  });
});
