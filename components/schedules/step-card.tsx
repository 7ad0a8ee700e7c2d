import type { Href } from 'expo-router';
import { useState } from 'react';
import { useController, useWatch, type Control } from 'react-hook-form';
import { StyleSheet, View } from 'react-native';

import type { BandId } from '@/shared/domain';
import type { ScheduleIssue } from '@/shared/domain/schedule';
import type { ScheduleValues } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import type { BandChoice } from './band-choices';
import { bandName, hoursLabel } from './schedule-words';
import { NumberField } from '../form/number-field';
import { ChoiceChips } from '../ui/choice-chips';

export type StepCardProps = {
  control: Control<ScheduleValues>;
  index: number;
  count: number;
  choices: readonly BandChoice[];
  /** The live checks for this step. */
  issues: readonly ScheduleIssue[];
  /** The server's message for this step after a refused save. */
  serverError?: string;
  /** The station's bands screen, where bands are enabled and calibrated. */
  bandsHref: Href;
  onMoveUp: () => void;
  onMoveDown: () => void;
  onRemove: () => void;
};

const NIGHT = { fromHour: 19, toHour: 7 };

/** One step of the rotation: its band, how many slots it holds, and optional active hours in UTC. */
export function StepCard({
  control,
  index,
  count,
  choices,
  issues,
  serverError,
  bandsHref,
  onMoveUp,
  onMoveDown,
  onRemove,
}: StepCardProps) {
  const { colors } = useAppTheme();
  const n = index + 1;
  const band = useController({ control, name: `steps.${index}.bandId` });
  const hours = useController({ control, name: `steps.${index}.activeHoursUtc` });
  const [explained, setExplained] = useState<BandChoice | null>(null);
  const bandId = band.field.value as BandId;
  const blocks = issues.filter((i) => i.level === 'block');
  const warns = issues.filter((i) => i.level === 'warn');
  const chosen = choices.find((c) => c.bandId === bandId);
  const bandBlocked = blocks.length > 0 || !!serverError || (chosen && !chosen.usable);
  // watch the whole step: a controller on the hours object misses changes made through its own fields
  const watched = useWatch({ control, name: `steps.${index}` }) as ScheduleValues['steps'][number] | undefined;
  const activeHours = watched?.activeHoursUtc ?? (hours.field.value as ScheduleValues['steps'][number]['activeHoursUtc']);
  return (
    <Card style={blocks.length || serverError ? [styles.blocked, { borderColor: colors.danger }] : undefined}>
      <View style={styles.head}>
        <View style={styles.title}>
          <Text variant="caption" tone="muted">
            Step {n} of {count}
          </Text>
          <Heading level={3} aria-label={`Step ${n}: ${bandName(bandId)}, ${hoursLabel(activeHours)}`}>
            {bandName(bandId)} <Text tone="muted">· {hoursLabel(activeHours)}</Text>
          </Heading>
        </View>
        <View style={styles.actions}>
          <Button
            label="Up"
            variant="ghost"
            accessibilityLabel={`Move step ${n} up`}
            onPress={onMoveUp}
            disabled={index === 0}
            style={styles.small}
          />
          <Button
            label="Down"
            variant="ghost"
            accessibilityLabel={`Move step ${n} down`}
            onPress={onMoveDown}
            disabled={index === count - 1}
            style={styles.small}
          />
          <Button label="Remove" variant="ghost" accessibilityLabel={`Remove step ${n}`} onPress={onRemove} style={styles.small} />
        </View>
      </View>

      <ChoiceChips<BandId>
        label={`Band for step ${n}`}
        showLabel={false}
        value={bandId}
        options={choices.map((c) => ({
          value: c.bandId,
          label: c.name,
          unavailable: !c.usable,
          accessibilityLabel: c.usable ? `Step ${n}: ${c.name}` : `Step ${n}: ${c.name} (not available)`,
        }))}
        onChange={(picked) => {
          const choice = choices.find((c) => c.bandId === picked)!;
          if (choice.usable) {
            setExplained(null);
            band.field.onChange(choice.bandId);
          } else {
            setExplained(choice);
          }
        }}
      />
      <Text variant="caption" tone="muted">
        Faded bands cannot be used yet: press one to see why.
      </Text>
      {explained ? (
        <View style={styles.reason} accessibilityLiveRegion="polite">
          <Text variant="label" tone="danger">
            {explained.name} cannot be used: {explained.reason}
          </Text>
          <TextLink href={bandsHref} label="Open the station's bands" variant="caption" />
        </View>
      ) : null}

      <View style={styles.fields}>
        <NumberField
          control={control}
          name={`steps.${index}.slots`}
          label="Slots in a row"
          hint="1 to 30 two-minute slots"
          style={styles.field}
        />
      </View>

      <ChoiceChips<'all' | 'hours'>
        label={`Hours for step ${n}`}
        value={activeHours ? 'hours' : 'all'}
        options={[
          { value: 'all', label: 'All day', accessibilityLabel: `Step ${n} runs all day` },
          { value: 'hours', label: 'Only certain hours (UTC)', accessibilityLabel: `Step ${n} runs only at certain hours` },
        ]}
        onChange={(picked) => hours.field.onChange(picked === 'all' ? null : (activeHours ?? NIGHT))}
      />
      {activeHours ? (
        <View style={styles.fields}>
          <NumberField
            control={control}
            name={`steps.${index}.activeHoursUtc.fromHour`}
            label="From hour (UTC)"
            hint="0 to 23"
            style={styles.field}
          />
          <NumberField
            control={control}
            name={`steps.${index}.activeHoursUtc.toHour`}
            label="To hour (UTC)"
            hint="1 to 24; wraps past midnight"
            style={styles.field}
          />
        </View>
      ) : null}

      {serverError ? (
        <Text variant="label" tone="danger" accessibilityRole="alert">
          {serverError}
        </Text>
      ) : null}
      {blocks.map((issue) => (
        <Text key={issue.message} variant="label" tone="danger" accessibilityRole="alert">
          {issue.message}
        </Text>
      ))}
      {bandBlocked ? <TextLink href={bandsHref} label="Enable or calibrate bands" variant="caption" /> : null}
      {warns.map((issue) => (
        <Text key={issue.message} variant="caption" tone="signal">
          {issue.message}
        </Text>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  blocked: { borderLeftWidth: 4 },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'center', gap: space.sm },
  title: { flexShrink: 1, minWidth: 160 },
  actions: { flexDirection: 'row', gap: space.xs },
  small: { minHeight: 38, paddingHorizontal: space.sm },
  reason: { gap: space.xs },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  field: { flexGrow: 1, flexBasis: 140 },
});
