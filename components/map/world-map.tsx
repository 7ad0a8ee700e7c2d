/**
 * Who heard the station, on a world map drawn by us with react-native-svg. Loaded lazily in its own
 * chunk (lazy-world-map.tsx): the outlines and d3-geo stay out of the start-up bundle.
 */
import { useMemo, useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import Svg, { Circle, G, Path } from 'react-native-svg';

import type { ReachReceiver } from '@/shared/api/receptions';
import type { BandId } from '@/shared/domain/bands';

import { bandColour, SNR_STEPS, snrColour, sortBands } from '../receptions/colours';
import { bandName, formatBearing, formatDb, formatKm } from '../receptions/format';
import { formatUtcDateTime } from '../ui/format';
import { SegmentedChoice } from '../ui/segmented-choice';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { greatCirclePath, mapFrame, projectPoint } from './projection';

export type MapColouring = 'band' | 'snr';

export type WorldMapProps = {
  station: { callsign: string; locator: string; lat: number; lon: number };
  receivers: ReachReceiver[];
  width: number;
  /** the band filter, when one is set: receivers are drawn in that band's colour */
  bandId?: BandId | null;
};

/** A receiver's colour: its (first) band, or its best SNR. */
function receiverColour(receiver: ReachReceiver, colouring: MapColouring, bandId?: BandId | null): string {
  if (colouring === 'snr') return snrColour(receiver.bestSnrDb);
  const band = bandId && receiver.bands.includes(bandId) ? bandId : sortBands(receiver.bands)[0];
  return band ? bandColour(band) : '#777777';
}

export function receiverSummary(receiver: ReachReceiver): string {
  return `${receiver.callsign} at ${receiver.locator}, ${formatKm(receiver.distanceKm)}, best SNR ${formatDb(receiver.bestSnrDb)}`;
}

const HIT = 22;

export default function WorldMap({ station, receivers, width, bandId }: WorldMapProps) {
  const { colors, scheme } = useAppTheme();
  const [colouring, setColouring] = useState<MapColouring>('band');
  const [selected, setSelected] = useState<string | null>(null);
  const frame = useMemo(() => mapFrame(Math.max(240, Math.round(width)), station), [width, station]);
  const drawn = useMemo(
    () =>
      receivers
        .map((receiver) => ({ receiver, at: projectPoint(frame, receiver), path: greatCirclePath(frame, station, receiver) }))
        .filter((item): item is typeof item & { at: [number, number] } => item.at !== null)
        // the furthest first, so near receivers end on top
        .sort((a, b) => b.receiver.distanceKm - a.receiver.distanceKm),
    [frame, receivers, station],
  );
  const home = projectPoint(frame, station);
  const chosen = receivers.find((r) => r.callsign === selected) ?? null;
  const bands = sortBands(receivers.flatMap((r) => r.bands));
  const ocean = scheme === 'dark' ? '#0C2429' : '#E4EEF0';
  const landFill = scheme === 'dark' ? '#23393E' : '#D7CFBD';
  const dotRadius = receivers.length > 150 ? 2.6 : 3.6;

  return (
    <View style={styles.root}>
      <View style={styles.toolbar}>
        <SegmentedChoice
          label="Colour the receivers by"
          options={[
            { value: 'band', label: 'Band' },
            { value: 'snr', label: 'SNR' },
          ]}
          value={colouring}
          onChange={setColouring}
        />
      </View>
      <View style={{ width: frame.width, height: frame.height }}>
        <Svg
          width={frame.width}
          height={frame.height}
          accessibilityRole="image"
          accessibilityLabel={`World map: ${station.callsign} at ${station.locator} and ${receivers.length} receiver${receivers.length === 1 ? '' : 's'} with their great-circle paths`}
        >
          <Path d={frame.sphere} fill={ocean} stroke={colors.border} strokeWidth={1} />
          <Path d={frame.graticule} fill="none" stroke={colors.border} strokeWidth={0.5} strokeOpacity={0.6} />
          <Path d={frame.land} fill={landFill} stroke={scheme === 'dark' ? '#33504F' : '#BFB49C'} strokeWidth={0.5} />
          <G>
            {drawn.map(({ receiver, path }) => (
              <Path
                key={`path-${receiver.callsign}`}
                d={path}
                fill="none"
                stroke={receiverColour(receiver, colouring, bandId)}
                strokeOpacity={selected === null || selected === receiver.callsign ? 0.55 : 0.12}
                strokeWidth={selected === receiver.callsign ? 2 : 1}
              />
            ))}
          </G>
          <G>
            {drawn.map(({ receiver, at }) => (
              <Circle
                key={`dot-${receiver.callsign}`}
                cx={at[0]}
                cy={at[1]}
                r={selected === receiver.callsign ? dotRadius + 2.5 : dotRadius}
                fill={receiverColour(receiver, colouring, bandId)}
                stroke={selected === receiver.callsign ? colors.text : colors.surface}
                strokeWidth={selected === receiver.callsign ? 2 : 0.8}
              />
            ))}
          </G>
          {home ? (
            <G>
              <Circle cx={home[0]} cy={home[1]} r={8} fill={colors.signal} fillOpacity={0.25} />
              <Circle cx={home[0]} cy={home[1]} r={4.5} fill={colors.signal} stroke={colors.surface} strokeWidth={1.5} />
            </G>
          ) : null}
        </Svg>
        {/* pressable spots over the dots: hover, tap and keyboard focus show a receiver's details */}
        {drawn.map(({ receiver, at }) => (
          <Pressable
            key={`hit-${receiver.callsign}`}
            accessibilityRole="button"
            accessibilityLabel={`Receiver ${receiverSummary(receiver)}`}
            accessibilityState={{ selected: selected === receiver.callsign }}
            onPress={() => setSelected(receiver.callsign)}
            onHoverIn={() => setSelected(receiver.callsign)}
            onFocus={() => setSelected(receiver.callsign)}
            style={[styles.hit, { left: at[0] - HIT / 2, top: at[1] - HIT / 2 }]}
          />
        ))}
      </View>
      <View style={styles.legend} accessibilityLabel="Map legend">
        <View style={styles.legendItem}>
          <View style={[styles.swatch, styles.stationSwatch, { backgroundColor: colors.signal }]} />
          <Text variant="caption">{station.callsign} (this station)</Text>
        </View>
        {colouring === 'band'
          ? bands.map((band) => (
              <View key={band} style={styles.legendItem}>
                <View style={[styles.swatch, { backgroundColor: bandColour(band) }]} />
                <Text variant="caption">{bandName(band)}</Text>
              </View>
            ))
          : SNR_STEPS.map((step) => (
              <View key={step.label} style={styles.legendItem}>
                <View style={[styles.swatch, { backgroundColor: step.colour }]} />
                <Text variant="caption">{step.label}</Text>
              </View>
            ))}
      </View>
      <View style={[styles.details, { borderColor: colors.border, backgroundColor: colors.surface }]} accessibilityLiveRegion="polite">
        {chosen ? (
          <>
            <Text variant="label">
              <Text variant="mono">{chosen.callsign}</Text> · {chosen.locator}
            </Text>
            <Text variant="caption" tone="muted">
              {formatKm(chosen.distanceKm)} at {formatBearing(chosen.bearingDeg)} · {chosen.reports} report{chosen.reports === 1 ? '' : 's'}{' '}
              · best SNR {formatDb(chosen.bestSnrDb)}
            </Text>
            <Text variant="caption" tone="muted">
              {sortBands(chosen.bands).map(bandName).join(', ')} · last heard {formatUtcDateTime(chosen.lastHeardUtc)}
            </Text>
          </>
        ) : (
          <Text variant="caption" tone="muted">
            Point at a receiver, tap it or move to it with the Tab key to see who it is.
          </Text>
        )}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.sm },
  toolbar: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, alignItems: 'center' },
  hit: { position: 'absolute', width: HIT, height: HIT, borderRadius: HIT / 2 },
  legend: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  swatch: { width: 12, height: 12, borderRadius: 6 },
  stationSwatch: { width: 14, height: 14, borderRadius: 7 },
  details: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: 2, minHeight: 64 },
});
