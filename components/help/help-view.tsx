import { useEffect } from 'react';
import { Platform, StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Heading } from '../ui/heading';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { GLOSSARY } from './glossary-text';

const LIFE: {
  title: string;
  body: string;
  link: { href: '/units/new' | '/stations/new' | '/stations' | '/health' | '/receivers' | '/club'; label: string };
}[] = [
  {
    title: '1. Register the unit',
    body: 'Describe the hardware once: the controller and its time source, the clock generator and its crystal, the low-pass filters and the power chain. Faintline works out the power at the antenna and which bands the filters allow.',
    link: { href: '/units/new', label: 'Register a unit' },
  },
  {
    title: '2. Add a station',
    body: 'A station is your callsign and locator on one unit, in your licence region. It decides the messages the beacon sends.',
    link: { href: '/stations/new', label: 'Add a station' },
  },
  {
    title: '3. Enable and calibrate bands',
    body: 'Switch on the bands a filter covers. Measure one band against a receiver you trust (or let reception reports do it later): Faintline proposes an offset for every band so the four tones land inside the window.',
    link: { href: '/stations', label: 'Your stations' },
  },
  {
    title: '4. Plan the schedule',
    body: 'Choose which bands in which 2-minute UTC slots, how often, and a small stagger so you do not meet the same neighbour every time.',
    link: { href: '/stations', label: 'Open a station’s schedule' },
  },
  {
    title: '5. Connect the beacon',
    body: 'Create a device token for the station (or pair the device with a code). The beacon then fetches its plan, reports its heartbeats and tells which slots it sent.',
    link: { href: '/health', label: 'Beacon health' },
  },
  {
    title: '6. See who heard it',
    body: 'Reception reports come from listening posts and imported files. The results show who decoded each transmission, how far away, at what SNR, and how far off frequency.',
    link: { href: '/receivers', label: 'Listening posts and imports' },
  },
  {
    title: '7. Work with your club',
    body: 'A club admin sees members’ beacons, checks they are within the club’s rules, keeps them from colliding and can stop one.',
    link: { href: '/club', label: 'Your club' },
  },
];

/** The Help screen's body (under its title): the beacon's life in Faintline, then the glossary; `term` opens one entry and scrolls to it. */
export function HelpView({ term }: { term?: string }) {
  const { colors } = useAppTheme();
  useEffect(() => {
    if (!term || Platform.OS !== 'web' || typeof document === 'undefined') return;
    document.getElementById(`term-${term}`)?.scrollIntoView({ block: 'center' });
  }, [term]);
  return (
    <View style={styles.page}>
      <Text tone="muted">
        How a beacon goes from a board on the bench to reports from far away, and what the words on the screens mean.
      </Text>
      <Heading level={2}>A beacon’s life in Faintline</Heading>
      {LIFE.map((step) => (
        <Card key={step.title}>
          <Heading level={3} variant="label">
            {step.title}
          </Heading>
          <Text>{step.body}</Text>
          <TextLink href={step.link.href} label={step.link.label} />
        </Card>
      ))}
      <Card tone="signal">
        <Text variant="label">Safety and your licence</Text>
        <Text>
          Transmit only with your own callsign, within your licence’s power and bands, and always through the right low-pass filter. Keep
          antennas clear of people and power lines. Your local licence conditions always win over Faintline’s defaults.
        </Text>
      </Card>
      <Heading level={2}>Words used in Faintline</Heading>
      <View style={styles.glossary}>
        {GLOSSARY.map((entry) => {
          const chosen = entry.id === term;
          return (
            <View
              key={entry.id}
              nativeID={`term-${entry.id}`}
              style={[
                styles.entry,
                { borderColor: chosen ? colors.primary : colors.border },
                chosen && { backgroundColor: colors.primarySoft },
              ]}
            >
              <Heading level={3} variant="label">
                {entry.term}
              </Heading>
              <Text>{entry.body}</Text>
            </View>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  page: { gap: space.md },
  glossary: { gap: space.sm },
  entry: { borderWidth: 1, borderRadius: 8, padding: space.md, gap: space.xs },
});
