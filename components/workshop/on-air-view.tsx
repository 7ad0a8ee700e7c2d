import { StyleSheet, View } from 'react-native';

import { bandFor, TONE_SPACING_HZ, type BandId } from '@/shared/domain';
import { bandOnAir, stationMessages } from '@/shared/domain/workshop';
import type { Station, Unit } from '@/shared/schemas';

import { SafetyCard } from '../overview/safety-card';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { ChoiceChips } from '../ui/choice-chips';
import { FormSection } from '../form/form-section';
import { formatHz, formatSigned } from '../ui/format';
import { HarmonicsPanel } from './harmonics-panel';
import { MessagePlan } from './message-plan';
import { SynthTable } from './synth-table';
import { WindowGauge } from './window-gauge';
import { TermInfo } from '../help/term-info';

export type OnAirViewProps = {
  station: Station;
  unit: Unit;
  bandId: BandId;
  /** bands to switch between (the enabled ones) */
  bandIds: BandId[];
  onBand: (bandId: BandId) => void;
};

/** Everything the station puts on one band: messages and symbols, tones, synthesizer settings and harmonics. */
export function OnAirView({ station, unit, bandId, bandIds, onBand }: OnAirViewProps) {
  const air = bandOnAir(station, unit, bandId);
  const names = (id: BandId) => {
    const found = bandFor(id, station.region);
    return found.ok ? found.band.name : id;
  };
  return (
    <View style={styles.wrap}>
      {bandIds.length > 1 ? (
        <ChoiceChips
          label="Band"
          options={bandIds.map((id) => ({ value: id, label: names(id) }))}
          chipLabel={(option) => `Show ${option.label}`}
          value={bandId}
          onChange={onBand}
        />
      ) : null}
      {'problem' in air ? (
        <Notice message={air.problem} />
      ) : (
        <>
          {!air.coverage.covered ? <Notice message={`${air.coverage.reason} The beacon will not transmit on ${air.band.name}.`} /> : null}
          {!air.enabled ? <Notice tone="info" message={`${air.band.name} is not enabled: this is what it would send.`} /> : null}
          <FormSection
            title="Messages"
            description={`Callsign ${station.callsign}, locator ${station.locator}.`}
            action={<TermInfo term="message-types" />}
          >
            <MessagePlan plan={stationMessages(station, unit)} showSymbols />
          </FormSection>
          <FormSection
            title="Tones"
            description={`Dial frequency ${formatHz(air.band.dialHz, 0)} plus the audio offset of ${station.audioOffsetHz} Hz.`}
          >
            {air.command.tonesHz.map((toneHz, index) => (
              <View key={index} style={styles.toneRow}>
                <Text variant="label" style={styles.toneLabel}>
                  Tone {index}
                </Text>
                <View style={styles.toneValues}>
                  <Text variant="mono">{formatHz(toneHz, 3)}</Text>
                  <Text variant="caption" tone="muted">
                    commanded {formatHz(air.command.commandTonesHz[index], 3)}
                  </Text>
                </View>
              </View>
            ))}
            <Text variant="caption" tone="muted">
              Tones are {TONE_SPACING_HZ.toFixed(4)} Hz apart.{' '}
              {air.calibrated
                ? `Calibration ${formatSigned(air.calibrationOffsetHz, 2, 'Hz')}: each tone is commanded ${formatSigned(air.command.correctionHz, 2, 'Hz')} from where it should land.`
                : 'This band is not calibrated: the tones land within the unit’s tolerance of these values.'}
            </Text>
            <WindowGauge
              bandName={air.band.name}
              dialHz={air.band.dialHz}
              window={air.window}
              toleranceHz={air.toleranceHz}
              warmUpDriftHz={air.warmUpDriftHz}
              driftedWindow={air.driftedWindow}
              calibrated={air.calibrated}
            />
          </FormSection>
          <FormSection
            title="Synthesizer settings"
            description="What the generator is told for each tone, and what it really makes."
            action={<TermInfo term="registers" />}
          >
            {air.synth ? <SynthTable synth={air.synth} /> : <Text tone="muted">{air.synthProblem}</Text>}
          </FormSection>
          <FormSection
            title="Harmonics"
            description="Whether the low-pass filter keeps the harmonics below the limit."
            action={<TermInfo term="dbc" />}
          >
            <HarmonicsPanel harmonics={air.harmonics} bandName={air.band.name} />
          </FormSection>
        </>
      )}
      <SafetyCard />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  toneRow: { flexDirection: 'row', gap: space.md, alignItems: 'baseline' },
  toneLabel: { width: 60 },
  toneValues: { flex: 1, flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, alignItems: 'baseline' },
});
