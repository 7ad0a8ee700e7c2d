import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import type { BandId } from '@/shared/domain/bands';

import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { TextField } from '../ui/text-field';
import { space } from '../ui/theme';
import { ChoiceChips } from '../ui/choice-chips';
import { bandName } from './format';
import { checkCustomRange, PERIOD_OPTIONS, type PeriodChoice, utcInputText } from './period';

export type ResultsFiltersProps = {
  period: PeriodChoice;
  /** the range in force, shown as the custom fields' starting text */
  fromIso: string;
  toIso: string;
  bandId: BandId | null;
  bandIds: BandId[];
  onPeriod: (period: Exclude<PeriodChoice, 'custom'>) => void;
  onCustom: (range: { from: string; to: string }) => void;
  onBand: (bandId: BandId | null) => void;
};

const ALL = 'all';

/** Period (rolling or custom, UTC) and band. */
export function ResultsFilters({ period, fromIso, toIso, bandId, bandIds, onPeriod, onCustom, onBand }: ResultsFiltersProps) {
  const [custom, setCustom] = useState(period === 'custom');
  const [fromText, setFromText] = useState(() => utcInputText(Date.parse(fromIso)));
  const [toText, setToText] = useState(() => utcInputText(Date.parse(toIso)));
  const [error, setError] = useState<string | null>(null);
  const shown: PeriodChoice = custom ? 'custom' : period;

  const apply = () => {
    const check = checkCustomRange(fromText, toText);
    if (!check.ok) return setError(check.message);
    setError(null);
    onCustom({ from: check.from, to: check.to });
  };

  return (
    <View style={styles.root}>
      <ChoiceChips
        label="Period (UTC)"
        options={PERIOD_OPTIONS}
        value={shown}
        onChange={(next) => {
          if (next === 'custom') {
            setFromText(utcInputText(Date.parse(fromIso)));
            setToText(utcInputText(Date.parse(toIso)));
            return setCustom(true);
          }
          setCustom(false);
          setError(null);
          onPeriod(next);
        }}
      />
      {custom ? (
        <View style={styles.custom}>
          <TextField
            label="From (UTC)"
            value={fromText}
            onChangeText={setFromText}
            placeholder="2026-11-30 00:00"
            mono
            style={styles.field}
            hint="YYYY-MM-DD HH:MM"
          />
          <TextField label="To (UTC)" value={toText} onChangeText={setToText} placeholder="2026-12-02 00:00" mono style={styles.field} />
          <Button label="Show this period" onPress={apply} style={styles.apply} />
        </View>
      ) : null}
      {error ? <Notice message={error} /> : null}
      <ChoiceChips<string>
        label="Band"
        options={[{ value: ALL, label: 'All bands' }, ...bandIds.map((b) => ({ value: b, label: bandName(b) }))]}
        value={bandId ?? ALL}
        onChange={(next) => onBand(next === ALL ? null : (next as BandId))}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: space.md },
  custom: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-end' },
  field: { flexGrow: 1, flexBasis: 160 },
  apply: { marginBottom: 22 },
});
