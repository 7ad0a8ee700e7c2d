import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { estimateExposure } from '@/shared/domain/bench';
import { bandFor } from '@/shared/domain/bands';
import { cadencePercent } from '@/shared/domain/schedule';
import { stationPower } from '@/shared/domain/workshop';
import type { Station, Unit } from '@/shared/schemas';

import { useScheduleQuery } from '../schedules/queries';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { space } from '../ui/theme';
import { FormSection } from '../form/form-section';
import { formatValue } from '../ui/format';
import { parseNumberText } from '../form/number-text';

const metres = (m: number) => (m < 1 ? `${(m * 100).toFixed(m < 0.1 ? 1 : 0)} cm` : `${m.toFixed(1)} m`);

/** The station's RF exposure, estimated band by band from its power, antenna, feed line and share of time on air. */
export function ExposureCard({ station, unit }: { station: Station; unit: Unit | null }) {
  const schedule = useScheduleQuery(station.id);
  const [lossText, setLossText] = useState('0');
  const lossDb = parseNumberText(lossText);
  const cadence = schedule.data?.cadence;
  const duty = cadence ? cadencePercent(cadence) / 100 : 1;
  const bands = useMemo(() => {
    const ids = [
      ...new Set([...station.bands.filter((b) => b.enabled).map((b) => b.bandId), ...(schedule.data?.steps ?? []).map((s) => s.bandId)]),
    ];
    return ids.flatMap((id) => {
      const found = bandFor(id, station.region);
      return found.ok ? [found.band] : [];
    });
  }, [station.bands, station.region, schedule.data]);

  let body;
  if (!unit) body = <Text tone="muted">Assign a unit to estimate the exposure: its power and antenna gain are needed.</Text>;
  else if (bands.length === 0) body = <Text tone="muted">Enable a band to see the estimate for it.</Text>;
  else {
    const powerW = stationPower(unit).outputMw / 1000;
    const rows = bands.map((band) => ({
      band,
      estimate: estimateExposure({
        powerW,
        gainDbi: unit.antenna.gainDbi,
        frequencyHz: band.dialHz + station.audioOffsetHz,
        lossDb: lossDb ?? 0,
        duty,
      }),
    }));
    // the lowest band has the largest near field: its cautions cover every band
    const first = rows.flatMap((r) => (r.estimate.ok ? [r.estimate] : [])).sort((a, b) => b.nearFieldM - a.nearFieldM)[0];
    body = (
      <>
        <TextField
          label="Feed-line loss (dB)"
          value={lossText}
          onChangeText={setLossText}
          inputMode="decimal"
          hint="Loss of the cable between the unit and the antenna; 0 gives the most cautious figure."
          error={lossDb === undefined || Number.isNaN(lossDb) ? 'Enter a number, such as 0 or 1.5' : undefined}
        />
        <Text tone="muted">
          {formatValue(powerW * 1000, 0, 'mW')} into a {formatValue(unit.antenna.gainDbi, 2, 'dBi')} antenna,{' '}
          {schedule.data
            ? `on the air ${formatValue(duty * 100, 0, '%')} of the time (the schedule)`
            : 'on the air all the time (no schedule yet)'}
          .
        </Text>
        <View style={styles.rows}>
          {rows.map(({ band, estimate }) =>
            estimate.ok ? (
              <View key={band.id} style={styles.row} accessibilityLabel={`Exposure on ${band.name}`}>
                <Text variant="label" style={styles.band}>
                  {band.name}
                </Text>
                <Text variant="mono">
                  EIRP {formatValue(estimate.eirpW * 1000, 0, 'mW')} · limit {formatValue(estimate.limitWPerM2, 2, 'W/m²')} · distance{' '}
                  {metres(estimate.distanceM)} ({metres(estimate.distanceWithGroundReflectionM)} with ground reflection)
                </Text>
              </View>
            ) : (
              <Text key={band.id} tone="muted">
                {band.name}: {estimate.reason}
              </Text>
            ),
          )}
        </View>
        {first ? (
          <>
            <Text variant="caption" tone="muted">
              Limits: {first.source}. Formula: {first.formula}.
            </Text>
            {first.cautions.map((c) => (
              <Text key={c} variant="caption" tone={c.includes('near field') ? 'signal' : 'muted'}>
                {c}
              </Text>
            ))}
          </>
        ) : null}
      </>
    );
  }
  return (
    <FormSection
      title="RF exposure, estimated"
      description="How far from the antenna the average power density falls within the general-public limit. Keep people away from antennas and follow local rules and licensed practice."
    >
      {body}
    </FormSection>
  );
}

const styles = StyleSheet.create({
  rows: { gap: space.sm },
  row: { gap: 2 },
  band: { minWidth: 60 },
});
