import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';

import { useFleetHealthQuery } from '../health/queries';
import { useStationsAtAGlanceQuery } from '../receptions/queries';
import { useStationsQuery } from '../stations/queries';
import { useUnitsQuery } from '../units/queries';
import { Card } from '../ui/card';
import { List, ListItem } from '../ui/list';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { firstSteps, type FirstStep } from './first-steps-list';

/** A new account's way in: six steps from hardware to "heard", each ticking itself off. Hidden once all are done. */
export function FirstStepsCard() {
  const units = useUnitsQuery();
  const stations = useStationsQuery();
  const health = useFleetHealthQuery();
  const glances = useStationsAtAGlanceQuery();
  if (!units.data || !stations.data) return null;
  const steps = firstSteps({ units: units.data, stations: stations.data, health: health.data ?? [], glances: glances.data ?? [] });
  const done = steps.filter((s) => s.done).length;
  if (done === steps.length) return null;
  const next = steps.find((s) => !s.done);
  return (
    <Card tone="primary">
      <Heading level={2}>Getting your beacon on the air</Heading>
      <Text tone="muted">
        {done} of {steps.length} steps done. Each step ticks itself off when it is done.
      </Text>
      <List style={styles.list}>
        {steps.map((step, index) => (
          <StepRow key={step.key} step={step} number={index + 1} next={step === next} />
        ))}
      </List>
    </Card>
  );
}

function StepRow({ step, number, next }: { step: FirstStep; number: number; next: boolean }) {
  const { colors } = useAppTheme();
  return (
    <ListItem style={styles.row}>
      <View style={[styles.tick, { borderColor: colors.primary, backgroundColor: step.done ? colors.primary : 'transparent' }]} aria-hidden>
        <Text variant="label" style={{ color: step.done ? colors.onPrimary : colors.primary }}>
          {step.done ? '✓' : String(number)}
        </Text>
      </View>
      <View style={styles.words}>
        <Link href={step.href} asChild>
          <Pressable
            accessibilityRole="link"
            accessibilityLabel={`Step ${number}: ${step.title}${step.done ? ', done' : next ? ', next' : ''}`}
            style={styles.target}
          >
            <Text variant="label" tone="primary" style={styles.link}>
              {step.title}
            </Text>
          </Pressable>
        </Link>
        {next ? (
          <Text variant="caption" tone="primary">
            Next step
          </Text>
        ) : null}
        <Text variant="caption" tone="muted">
          {step.done ? 'Done.' : step.detail}
        </Text>
      </View>
    </ListItem>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { flexDirection: 'row', gap: space.md, alignItems: 'flex-start' },
  tick: { width: 28, height: 28, borderRadius: 14, borderWidth: 2, alignItems: 'center', justifyContent: 'center', marginTop: 8 },
  words: { flex: 1 },
  target: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
  link: { textDecorationLine: 'underline' },
});
