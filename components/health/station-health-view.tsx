import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import type { AlertSettings, StationHealth } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { formatUtcDateTime } from '../ui/format';
import { EmptyState } from '../ui/query-states';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { AlertList } from './alert-list';
import { AlertSettingsForm } from './alert-settings-form';
import { HealthFigure } from './health-figure';
import { LazyHealthCharts } from './lazy-charts';
import { LinkBadge } from './link-badge';
import {
  formatClockOffset,
  formatDrift,
  formatSupply,
  formatTemperature,
  heardWords,
  linkStateOf,
  openAlerts,
  recentWords,
  utcTime,
} from './words';
import { Heading } from '../ui/heading';
import { ScreenTitle } from '../ui/screen-title';

export type StationHealthViewProps = {
  health: StationHealth;
  /** the right edge of the charts' 24-hour window (when the answer came) */
  nowMs: number;
  readOnly: boolean;
  onSaveSettings: (settings: AlertSettings) => Promise<unknown>;
  onOpenDevice?: () => void;
};

/** One station's health: the latest report, open alerts, 24-hour charts, transmissions, history, thresholds. */
export function StationHealthView({ health, nowMs, readOnly, onSaveSettings, onOpenDevice }: StationHealthViewProps) {
  const { colors } = useAppTheme();
  const [chartWidth, setChartWidth] = useState(0);
  const open = openAlerts(health);
  const history = health.alerts.filter((a) => a.resolvedAt !== null);
  return (
    <>
      <View style={styles.head}>
        <View style={styles.headTitle}>
          <ScreenTitle>{health.stationName}</ScreenTitle>
          <Text variant="mono" tone="muted">
            {health.callsign}
          </Text>
        </View>
        <LinkBadge state={linkStateOf(health)} />
      </View>

      {!health.hasDevice ? (
        <EmptyState
          title="No device yet"
          message="Create a device token so this station's beacon can report its clock, temperature and transmissions to Faintline."
          action={onOpenDevice ? <Button label="Create a device token" onPress={onOpenDevice} /> : undefined}
        />
      ) : (
        <Card>
          <Text variant="caption" tone="muted">
            {heardWords(health)}
            {health.lastHeartbeatAt ? ` · ${formatUtcDateTime(health.lastHeartbeatAt)}` : ''}
            {health.firmwareVersion ? ` · firmware ${health.firmwareVersion}` : ''}
          </Text>
          <View style={styles.figures}>
            <HealthFigure large label="Clock offset" value={formatClockOffset(health.clockOffsetMs)} />
            <HealthFigure large label="Temperature" value={formatTemperature(health.temperatureC)} />
            <HealthFigure large label="Drift it implies" value={formatDrift(health.driftHz)} />
            <HealthFigure large label="Supply" value={formatSupply(health.supplyV)} />
          </View>
          <Text variant="caption" tone="muted">
            Drift: how far the temperature moves the signal on its worst band, from the unit's temperature coefficient (against 20 °C).
          </Text>
        </Card>
      )}

      <View style={styles.section}>
        <Heading level={2}>Open alerts</Heading>
        {open.length === 0 ? <Text tone="muted">No open alerts.</Text> : <AlertList alerts={open} />}
      </View>

      {health.hasDevice ? (
        <Card>
          <Heading level={2}>Last 24 hours</Heading>
          <View style={styles.chartBox} onLayout={(event) => setChartWidth(Math.floor(event.nativeEvent.layout.width))}>
            {chartWidth > 0 ? (
              <LazyHealthCharts series={health.series} nowMs={nowMs} width={chartWidth} clockLimitMs={health.settings.clockOffsetMs} />
            ) : null}
          </View>
        </Card>
      ) : null}

      {health.hasDevice ? (
        <View style={styles.section}>
          <Heading level={2}>Transmissions</Heading>
          <Text tone="muted">{recentWords(health.recent)} (checked against the station's schedule).</Text>
          {health.recent.length > 0 ? (
            <View style={[styles.txList, { borderColor: colors.border }]}>
              {health.recent.slice(0, 12).map((tx) => (
                <View key={`${tx.startUtc}-${tx.bandId}`} style={[styles.txRow, { borderColor: colors.border }]}>
                  <Text variant="mono">{utcTime(tx.startUtc)}</Text>
                  <Text variant="mono" style={styles.txBand}>
                    {tx.bandId}
                  </Text>
                  <Text variant="label" tone={tx.planned ? 'primary' : 'signal'}>
                    {tx.planned ? 'As planned' : 'Unplanned'}
                  </Text>
                </View>
              ))}
            </View>
          ) : null}
        </View>
      ) : null}

      {history.length > 0 ? (
        <View style={styles.section}>
          <Heading level={2}>Alert history (24 h)</Heading>
          <AlertList alerts={history} />
        </View>
      ) : null}

      <Card>
        <Heading level={2}>Alert thresholds</Heading>
        <Text variant="caption" tone="muted">
          The server checks every station once a minute; an alert opens once, is mailed once, and closes by itself when the cause goes away.
        </Text>
        <AlertSettingsForm settings={health.settings} onSubmit={onSaveSettings} readOnly={readOnly} />
      </Card>

      {health.hasDevice && onOpenDevice ? (
        <Button
          label="Device token"
          accessibilityLabel="Device token: manage it"
          variant="secondary"
          onPress={onOpenDevice}
          style={styles.deviceButton}
        />
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.md },
  headTitle: { flex: 1, gap: 2 },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.xl, rowGap: space.md, paddingVertical: space.xs },
  section: { gap: space.sm },
  chartBox: { width: '100%' },
  txList: { borderTopWidth: 1 },
  txRow: { flexDirection: 'row', alignItems: 'center', gap: space.lg, paddingVertical: space.sm, borderBottomWidth: 1 },
  txBand: { minWidth: 48 },
  deviceButton: { alignSelf: 'flex-start' },
});
