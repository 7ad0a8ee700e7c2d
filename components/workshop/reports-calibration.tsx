import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { bandFor, checkTonesInWindow, toneFrequenciesHz, type BandId } from '@/shared/domain';
import { heardWindow } from '@/shared/domain/reception/calibration-from-reports';
import { bandOnAir } from '@/shared/domain/workshop';
import type { Station, Unit } from '@/shared/schemas';

import { useConfirmedMutation } from '../query/use-confirmed-mutation';
import { Button } from '../ui/button';
import { ConfirmDialog } from '../ui/confirm-dialog';
import { formatSigned, formatUtcDateTime, formatValue } from '../ui/format';
import { Notice } from '../ui/notice';
import { EmptyState, ErrorState, LoadingState } from '../ui/query-states';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { useCalibrationFromReportsQuery, useSaveCalibrationMutation, type CalibrationFromReports } from './queries';
import { StabilityCard } from './stability-card';
import { WindowGauge } from './window-gauge';

type BandResult = CalibrationFromReports['bands'][number];
export type ReportsCalibrationProps = { station: Station; unit: Unit | null };

const bandName = (station: Station, bandId: string) => {
  const found = bandFor(bandId as BandId, station.region);
  return found.ok ? found.band.name : bandId;
};

/** Gauges for one band: where receivers heard the tones, and where they land once the proposal is applied. */
function BeforeAfter({ station, unit, result }: { station: Station; unit: Unit | null; result: BandResult }) {
  const air = unit ? bandOnAir(station, unit, result.bandId as BandId) : null;
  if (!air || 'problem' in air || result.medianErrorHz === null) return null;
  const heard = heardWindow(result.dialHz, result.plannedCarrierHz, result.medianErrorHz);
  const drift = air.warmUpDriftHz;
  const heardDrifted =
    drift === null
      ? null
      : checkTonesInWindow(result.dialHz, toneFrequenciesHz(heard.tonesHz[0] + (heard.lowMarginHz < heard.highMarginHz ? -drift : drift)));
  const name = bandName(station, result.bandId);
  return (
    <View style={styles.gauges}>
      <Text variant="label">As heard now</Text>
      <WindowGauge
        bandName={name}
        dialHz={result.dialHz}
        window={heard}
        toleranceHz={air.toleranceHz}
        warmUpDriftHz={drift}
        driftedWindow={heardDrifted}
        calibrated={air.calibrated}
      />
      <Text variant="label">After applying {formatSigned(result.proposedOffsetHz!, 2, 'Hz')}</Text>
      <WindowGauge
        bandName={name}
        dialHz={result.dialHz}
        window={air.window}
        toleranceHz={air.toleranceHz}
        warmUpDriftHz={drift}
        driftedWindow={air.driftedWindow}
        calibrated
      />
    </View>
  );
}

function BandCard({ station, unit, result, onApply }: { station: Station; unit: Unit | null; result: BandResult; onApply: () => void }) {
  const { colors } = useAppTheme();
  const name = bandName(station, result.bandId);
  const current = result.currentOffsetHz === null ? 'not calibrated yet' : formatSigned(result.currentOffsetHz, 2, 'Hz');
  return (
    <View style={[styles.band, { borderColor: colors.border }]} accessibilityLabel={`${name} from reports`}>
      <Heading level={2}>{name}</Heading>
      <Text tone="muted">
        {result.reports} report{result.reports === 1 ? '' : 's'} from {result.receivers} receiver{result.receivers === 1 ? '' : 's'} since{' '}
        {formatUtcDateTime(result.sinceUtc)}. Current offset: {current}.
      </Text>
      {result.enough && result.medianErrorHz !== null && result.proposedOffsetHz !== null ? (
        <>
          <Text>
            Receivers heard you{' '}
            <Text variant="mono" tone="primary">
              {formatSigned(result.medianErrorHz, 2, 'Hz')}
            </Text>{' '}
            {result.medianErrorHz >= 0 ? 'high' : 'low'} (median; the middle half of the reports lies within{' '}
            {formatValue(result.spreadHz ?? 0, 1, 'Hz')}). Proposed offset:{' '}
            <Text variant="mono" tone="primary">
              {formatSigned(result.proposedOffsetHz, 2, 'Hz')}
            </Text>
            .
          </Text>
          {result.warning ? <Notice tone="info" message={result.warning} /> : null}
          <BeforeAfter station={station} unit={unit} result={result} />
          <Button label={`Apply ${formatSigned(result.proposedOffsetHz, 2, 'Hz')} to ${name}`} onPress={onApply} style={styles.apply} />
        </>
      ) : (
        <Text tone="muted">No proposal: {result.reason}</Text>
      )}
    </View>
  );
}

/**
 * Calibration from what receivers heard over the last 7 days (UTC): per band the median error, its spread and the
 * offset it proposes, the window before and after, and one confirmed click to apply it through the audited save.
 */
export function ReportsCalibration({ station, unit }: ReportsCalibrationProps) {
  const query = useCalibrationFromReportsQuery(station.id, true);
  const save = useSaveCalibrationMutation(station.id);
  const apply = useConfirmedMutation(save, null as BandResult | null);
  const [applied, setApplied] = useState<string | null>(null);

  if (query.isPending) return <LoadingState label="Reading what receivers heard…" />;
  if (query.isError) return <ErrorState title="The reports could not be read" error={query.error} onRetry={() => query.refetch()} />;
  const bands = query.data.bands;
  const asking = apply.asking;
  return (
    <View style={styles.wrap}>
      <Text tone="muted">
        Every report says at what frequency a receiver heard your beacon. Compared with where Faintline meant the tones to be, the median
        over many receivers shows what your correction still misses. Reports from {formatUtcDateTime(query.data.fromUtc)} to{' '}
        {formatUtcDateTime(query.data.toUtc)}; only reports heard after a band’s last calibration count.
      </Text>
      {applied ? <Notice tone="success" message={applied} /> : null}
      {bands.length === 0 ? (
        <EmptyState title="No bands yet" message="Enable a band and let the beacon transmit; reports of it show up here." />
      ) : (
        bands.map((result) => (
          <BandCard key={result.bandId} station={station} unit={unit} result={result} onApply={() => apply.ask(result)} />
        ))
      )}
      <StabilityCard stationId={station.id} region={station.region} readOnly={false} />
      <ConfirmDialog
        {...apply.dialog}
        title={asking ? `Apply ${formatSigned(asking.proposedOffsetHz ?? 0, 2, 'Hz')} to ${bandName(station, asking.bandId)}?` : 'Apply?'}
        message={
          asking
            ? `The offset on ${bandName(station, asking.bandId)} goes from ${asking.currentOffsetHz === null ? 'none' : formatSigned(asking.currentOffsetHz, 2, 'Hz')} to ${formatSigned(asking.proposedOffsetHz ?? 0, 2, 'Hz')}: from its next configuration poll the device sends ${formatValue(Math.abs(asking.medianErrorHz ?? 0), 2, 'Hz')} ${(asking.medianErrorHz ?? 0) >= 0 ? 'lower' : 'higher'} than now. The change is kept in the station’s history.`
            : ''
        }
        confirmLabel="Apply offset"
        onConfirm={() =>
          asking &&
          apply.confirm(
            { source: 'reports', offsets: [{ bandId: asking.bandId as BandId, calibrationOffsetHz: asking.proposedOffsetHz ?? 0 }] },
            (_station, subject) =>
              setApplied(`Applied ${formatSigned(subject.proposedOffsetHz ?? 0, 2, 'Hz')} to ${bandName(station, subject.bandId)}.`),
          )
        }
      />
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  band: { borderWidth: 1, borderRadius: radius.lg, padding: space.lg, gap: space.md },
  gauges: { gap: space.sm },
  apply: { alignSelf: 'flex-start' },
});
