import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { designPad, neededAttenuation, type PadBehaviour, type WantedOutput } from '@/shared/domain/bench';
import { dbmToMw } from '@/shared/domain/power';

import { Button } from '../ui/button';
import { SegmentedChoice } from '../ui/segmented-choice';
import { Text } from '../ui/text';
import { TextField } from '../ui/text-field';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { FormSection } from '../form/form-section';
import { formatPowerMw, formatValue } from '../ui/format';
import { parseNumberText } from '../form/number-text';

type WantedUnit = 'dbm' | 'mw' | 'wspr';

export type PadDesignerProps = {
  generatorDbm: number | undefined;
  amplifier: { gainDb?: number; saturatedDbm?: number } | null | undefined;
  filterLossDb: number;
  /** puts an attenuation into the unit's attenuator field */
  onUse?: (attenuationDb: number) => void;
};

const ohm = (value: number) =>
  `${Number.isInteger(value) ? value : value < 10 ? value.toFixed(2) : value < 100 ? value.toFixed(1) : value.toFixed(0)} Ω`;
const watts = (w: number) => (w >= 1 ? `${w.toFixed(2)} W` : `${(w * 1000).toFixed(w >= 0.01 ? 0 : 1)} mW`);

/** Works out the attenuator a chain needs and designs it as a matched resistive pad. */
export function PadDesigner({ generatorDbm, amplifier, filterLossDb, onUse }: PadDesignerProps) {
  const [wantedText, setWantedText] = useState('23');
  const [unit, setUnit] = useState<WantedUnit>('dbm');
  const [impedanceText, setImpedanceText] = useState('50');
  const [ratingText, setRatingText] = useState('0.25');
  const wanted = parseNumberText(wantedText);
  const impedance = parseNumberText(impedanceText);
  const rating = parseNumberText(ratingText);

  const needed = useMemo(() => {
    if (generatorDbm === undefined || !Number.isFinite(generatorDbm) || wanted === undefined || !Number.isFinite(wanted)) return null;
    const target: WantedOutput = unit === 'mw' ? { mw: wanted } : unit === 'wspr' ? { wsprLevelDbm: wanted } : { dbm: wanted };
    return neededAttenuation({
      generatorDbm,
      amplifierGainDb: amplifier?.gainDb,
      amplifierSaturationDbm: amplifier?.saturatedDbm,
      filterLossDb,
      wanted: target,
    });
  }, [generatorDbm, amplifier?.gainDb, amplifier?.saturatedDbm, filterLossDb, wanted, unit]);

  const pad = useMemo(() => {
    if (!needed?.ok || needed.neededDb <= 0.05 || generatorDbm === undefined) return null;
    return designPad({
      attenuationDb: Math.min(needed.neededDb, 60),
      impedanceOhm: impedance,
      inputW: dbmToMw(generatorDbm) / 1000,
      ratingW: rating,
    });
  }, [needed, impedance, rating, generatorDbm]);

  return (
    <FormSection
      title="Attenuator designer"
      description="From the generator level, the amplifier and the filter loss above: the attenuation for the output you want, and a resistive pad to build."
    >
      {generatorDbm === undefined || !Number.isFinite(generatorDbm) ? (
        <Text tone="muted">Fill in the generator output to design an attenuator.</Text>
      ) : (
        <>
          <View style={styles.pair}>
            <TextField
              label="Wanted output"
              value={wantedText}
              onChangeText={setWantedText}
              inputMode="decimal"
              hint={unit === 'wspr' ? '0, 3, 7, 10, 13 … 60 dBm' : unit === 'mw' ? 'e.g. 200 mW' : 'e.g. 23 dBm = 200 mW'}
              error={wanted === undefined || Number.isNaN(wanted) ? 'Enter a number, such as 23' : undefined}
              style={styles.pairItem}
            />
            <View style={[styles.pairItem, styles.unitChoice]}>
              <Text variant="label">Given in</Text>
              <SegmentedChoice
                label="Wanted output given in"
                value={unit}
                onChange={setUnit}
                options={[
                  { value: 'dbm', label: 'dBm' },
                  { value: 'mw', label: 'mW' },
                  { value: 'wspr', label: 'WSPR level' },
                ]}
              />
            </View>
          </View>
          {needed && !needed.ok ? <Text tone="danger">{needed.reason}</Text> : null}
          {needed?.ok ? (
            <View style={styles.block} accessibilityLabel="Attenuation needed">
              <Text variant="label">
                Needed: {formatValue(Math.max(0, needed.neededDb), 1, 'dB')} for {formatValue(needed.wantedDbm, 1, 'dBm')} (
                {formatPowerMw(dbmToMw(needed.wantedDbm))}) at the antenna
              </Text>
              {needed.notes.map((note) => (
                <Text key={note} tone="signal">
                  {note}
                </Text>
              ))}
              {needed.fixed.length ? (
                <View style={styles.chips}>
                  {needed.fixed.map((f) => (
                    <Button
                      key={f.attenuationDb}
                      variant="secondary"
                      label={`${f.attenuationDb} dB part → ${formatValue(f.outputDbm, 1, 'dBm')}`}
                      accessibilityLabel={`Use a ${f.attenuationDb} dB attenuator: ${f.attenuationDb} dB part → ${formatValue(f.outputDbm, 1, 'dBm')}`}
                      onPress={() => onUse?.(f.attenuationDb)}
                    />
                  ))}
                </View>
              ) : null}
              <Text variant="caption" tone="muted">
                Common fixed attenuators nearest the need; press one to put it in the attenuator field.
              </Text>
            </View>
          ) : null}
          <View style={styles.pair}>
            <TextField
              label="Line impedance (Ω)"
              value={impedanceText}
              onChangeText={setImpedanceText}
              inputMode="decimal"
              style={styles.pairItem}
            />
            <TextField
              label="Resistor rating (W)"
              value={ratingText}
              onChangeText={setRatingText}
              inputMode="decimal"
              hint="A common small resistor is 0.25 W."
              style={styles.pairItem}
            />
          </View>
          {pad && !pad.ok ? <Text tone="danger">{pad.reason}</Text> : null}
          {pad?.ok ? (
            <View style={styles.block}>
              <View style={styles.pads}>
                <PadCard
                  title={`Pi pad, ${formatValue(pad.attenuationDb, 2, 'dB')}`}
                  exact={[
                    ['Shunt (each side)', pad.pi.shuntOhm],
                    ['Series', pad.pi.seriesOhm],
                  ]}
                  chosen={[
                    ['Shunt (each side)', pad.e24.pi.shuntOhm],
                    ['Series', pad.e24.pi.seriesOhm],
                  ]}
                  behaviour={pad.e24.pi}
                />
                <PadCard
                  title={`T pad, ${formatValue(pad.attenuationDb, 2, 'dB')}`}
                  exact={[
                    ['Series (each side)', pad.t.seriesOhm],
                    ['Shunt', pad.t.shuntOhm],
                  ]}
                  chosen={[
                    ['Series (each side)', pad.e24.t.seriesOhm],
                    ['Shunt', pad.e24.t.shuntOhm],
                  ]}
                  behaviour={pad.e24.t}
                />
              </View>
              {pad.cautions.map((caution) => (
                <Text key={caution} tone="danger" accessibilityRole="alert">
                  {caution}
                </Text>
              ))}
              <Text variant="caption" tone="muted">
                Heat figures assume the generator’s {formatPowerMw(dbmToMw(generatorDbm))} goes into the pad. Build it with short leads and
                non-inductive (carbon or metal film) resistors.
              </Text>
            </View>
          ) : null}
        </>
      )}
    </FormSection>
  );
}

function PadCard({
  title,
  exact,
  chosen,
  behaviour,
}: {
  title: string;
  exact: [string, number][];
  chosen: [string, number][];
  behaviour: PadBehaviour;
}) {
  const { colors } = useAppTheme();
  return (
    <View style={[styles.card, { borderColor: colors.border }]} accessibilityLabel={title}>
      <Text variant="label">{title}</Text>
      {exact.map(([role, value], i) => (
        <View key={role} style={styles.line}>
          <Text variant="caption" tone="muted">
            {role}
          </Text>
          <Text variant="mono">
            {ohm(value)} → E24 {ohm(chosen[i][1])}
          </Text>
        </View>
      ))}
      <Text variant="caption">
        With E24 parts: {formatValue(behaviour.attenuationDb, 2, 'dB')}, input {ohm(behaviour.inputOhm)}, return loss{' '}
        {behaviour.returnLossDb === null ? 'perfect' : formatValue(behaviour.returnLossDb, 1, 'dB')}
      </Text>
      {behaviour.resistors.map((r) => (
        <Text key={r.role} variant="caption" tone={r.overRating ? 'danger' : 'muted'}>
          {r.role}: {watts(r.dissipatedW)}
          {r.overRating ? ` — above its ${r.ratingW} W rating` : ''}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  pairItem: { flexGrow: 1, flexBasis: 200 },
  unitChoice: { gap: space.xs },
  block: { gap: space.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  pads: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  card: { flexGrow: 1, flexBasis: 260, borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
  line: { gap: 2 },
});
