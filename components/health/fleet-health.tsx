import { Pressable, StyleSheet, View } from 'react-native';

import type { StationHealth } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { fonts, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { AlertList } from './alert-list';
import { HealthFigure } from './health-figure';
import { LinkBadge } from './link-badge';
import { formatClockOffset, formatDrift, formatTemperature, heardWords, linkStateOf, openAlerts, recentWords, utcTime } from './words';

export type FleetHealthProps = {
  fleet: StationHealth[];
  /** cards on a phone, a table from tablet width */
  layout: 'cards' | 'table';
  onOpenStation: (stationId: number) => void;
  /** where "create a token" leads; left out for people who cannot provision (club admins) */
  onOpenDevice?: (stationId: number) => void;
  /** show whose station it is (the club view) */
  ownerOf?: (stationId: number) => string | undefined;
};

/** Every station's link, clock, temperature, drift, recent transmissions and open alerts. */
export function FleetHealth({ fleet, layout, onOpenStation, onOpenDevice, ownerOf }: FleetHealthProps) {
  if (layout === 'table') return <FleetTable fleet={fleet} onOpenStation={onOpenStation} onOpenDevice={onOpenDevice} ownerOf={ownerOf} />;
  return (
    <View style={styles.cards}>
      {fleet.map((health) => (
        <HealthCard
          key={health.stationId}
          health={health}
          onOpenStation={onOpenStation}
          onOpenDevice={onOpenDevice}
          owner={ownerOf?.(health.stationId)}
        />
      ))}
    </View>
  );
}

function StationLink({ health, onPress }: { health: StationHealth; onPress: () => void }) {
  return (
    <Pressable accessibilityRole="link" accessibilityLabel={`Health of ${health.stationName}`} onPress={onPress} hitSlop={4}>
      <Text variant="heading" tone="primary" style={styles.underline} numberOfLines={2}>
        {health.stationName}
      </Text>
    </Pressable>
  );
}

function CreateToken({
  health,
  onOpenDevice,
  short = false,
}: {
  health: StationHealth;
  onOpenDevice?: (id: number) => void;
  short?: boolean;
}) {
  if (health.hasDevice || !onOpenDevice) return null;
  return (
    <Button
      label={short ? 'Create token' : 'Create a device token'}
      accessibilityLabel={`${short ? 'Create token' : 'Create a device token'} for ${health.stationName}`}
      variant="secondary"
      onPress={() => onOpenDevice(health.stationId)}
      style={styles.createButton}
    />
  );
}

function lastTransmission(health: StationHealth): string | null {
  const last = health.recent[0];
  if (!last) return null;
  return `Last ${utcTime(last.startUtc)} on ${last.bandId} · ${last.planned ? 'as planned' : 'unplanned'}`;
}

function HealthCard({
  health,
  onOpenStation,
  onOpenDevice,
  owner,
}: {
  health: StationHealth;
  onOpenStation: (id: number) => void;
  onOpenDevice?: (id: number) => void;
  owner?: string;
}) {
  const alerts = openAlerts(health);
  const last = lastTransmission(health);
  return (
    <Card tone={alerts.length > 0 ? 'signal' : 'plain'} style={styles.card}>
      <View style={styles.cardHead}>
        <View style={styles.cardTitle}>
          <StationLink health={health} onPress={() => onOpenStation(health.stationId)} />
          <Text variant="mono" tone="muted">
            {health.callsign}
            {owner ? ` · ${owner}` : ''}
          </Text>
        </View>
        <LinkBadge state={linkStateOf(health)} />
      </View>
      <Text variant="caption" tone="muted">
        {heardWords(health)}
        {health.firmwareVersion ? ` · firmware ${health.firmwareVersion}` : ''}
      </Text>
      {health.hasDevice && health.heartbeatAgeS !== null ? (
        <>
          <View style={styles.figures}>
            <HealthFigure label="Clock offset" value={formatClockOffset(health.clockOffsetMs)} />
            <HealthFigure label="Temperature" value={formatTemperature(health.temperatureC)} />
            <HealthFigure label="Drift it implies" value={formatDrift(health.driftHz)} />
          </View>
          <View style={styles.transmissions}>
            <Text variant="caption" tone="muted">
              Transmissions, last 24 h
            </Text>
            <Text variant="label">{recentWords(health.recent)}</Text>
            {last ? (
              <Text variant="caption" tone={health.recent[0]?.planned ? 'muted' : 'signal'}>
                {last}
              </Text>
            ) : null}
          </View>
        </>
      ) : null}
      <AlertList alerts={alerts} compact />
      <CreateToken health={health} onOpenDevice={onOpenDevice} />
    </Card>
  );
}

const columns = [
  { key: 'station', label: 'Station', flex: 2.2 },
  { key: 'link', label: 'Link', flex: 1.6 },
  { key: 'clock', label: 'Clock', flex: 1 },
  { key: 'temp', label: 'Temp.', flex: 1 },
  { key: 'drift', label: 'Drift', flex: 1 },
  { key: 'tx', label: 'Transmissions', flex: 1.6 },
  { key: 'alerts', label: 'Open alerts', flex: 2.6 },
] as const;

function FleetTable({ fleet, onOpenStation, onOpenDevice, ownerOf }: Omit<FleetHealthProps, 'layout'>) {
  const { colors } = useAppTheme();
  const cell = (key: (typeof columns)[number]['key']) => [styles.cell, { flex: columns.find((c) => c.key === key)!.flex }];
  return (
    <View role="table" aria-label="Fleet health" style={[styles.table, { borderColor: colors.border, backgroundColor: colors.surface }]}>
      <View role="row" style={[styles.row, styles.headRow, { borderColor: colors.border }]}>
        {columns.map((column) => (
          <View key={column.key} role="columnheader" style={cell(column.key)}>
            <Text variant="caption" tone="muted">
              {column.label}
            </Text>
          </View>
        ))}
      </View>
      {fleet.map((health, index) => {
        const alerts = openAlerts(health);
        const owner = ownerOf?.(health.stationId);
        return (
          <View
            key={health.stationId}
            role="row"
            style={[
              styles.row,
              { borderColor: colors.border },
              index === fleet.length - 1 && styles.lastRow,
              alerts.length > 0 && { backgroundColor: colors.signalSoft },
            ]}
          >
            <View role="cell" style={cell('station')}>
              <StationLink health={health} onPress={() => onOpenStation(health.stationId)} />
              <Text variant="caption" tone="muted" style={styles.mono}>
                {health.callsign}
                {owner ? ` · ${owner}` : ''}
              </Text>
            </View>
            <View role="cell" style={cell('link')}>
              <LinkBadge state={linkStateOf(health)} />
              <Text variant="caption" tone="muted">
                {heardWords(health)}
              </Text>
              <CreateToken health={health} onOpenDevice={onOpenDevice} short />
            </View>
            <View role="cell" style={cell('clock')}>
              <Text variant="mono">{health.hasDevice ? formatClockOffset(health.clockOffsetMs) : '—'}</Text>
            </View>
            <View role="cell" style={cell('temp')}>
              <Text variant="mono">{health.hasDevice ? formatTemperature(health.temperatureC) : '—'}</Text>
            </View>
            <View role="cell" style={cell('drift')}>
              <Text variant="mono">{health.hasDevice ? formatDrift(health.driftHz) : '—'}</Text>
            </View>
            <View role="cell" style={cell('tx')}>
              <Text variant="caption">{health.hasDevice ? recentWords(health.recent) : '—'}</Text>
              {health.recent[0] ? (
                <Text variant="caption" tone={health.recent[0].planned ? 'muted' : 'signal'}>
                  last {utcTime(health.recent[0].startUtc)}, {health.recent[0].bandId}
                </Text>
              ) : null}
            </View>
            <View role="cell" style={cell('alerts')}>
              {alerts.length === 0 ? (
                <Text variant="caption" tone="muted">
                  None
                </Text>
              ) : (
                <AlertList alerts={alerts} compact />
              )}
            </View>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  cards: { gap: space.md },
  card: { gap: space.sm },
  cardHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.md },
  cardTitle: { flex: 1, gap: 2 },
  underline: { textDecorationLine: 'underline' },
  transmissions: { gap: 2, minWidth: 90 },
  figures: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg, rowGap: space.sm },
  createButton: { alignSelf: 'flex-start', minHeight: 38, marginTop: space.xs },
  table: { borderWidth: 1, borderRadius: 16, overflow: 'hidden' },
  row: { flexDirection: 'row', borderBottomWidth: 1, paddingHorizontal: space.md, paddingVertical: space.md, gap: space.md },
  headRow: { paddingVertical: space.sm },
  lastRow: { borderBottomWidth: 0 },
  cell: { gap: 4, minWidth: 0 },
  mono: { fontFamily: fonts.mono },
});
