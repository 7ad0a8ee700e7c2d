import { StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { space } from '../ui/theme';
import { Heading } from '../ui/heading';

/** No reports in the period: says how reports reach Faintline, with the way to each. */
export function ResultsEmpty({ filtered }: { filtered: boolean }) {
  return (
    <Card>
      <Heading level={2}>{filtered ? 'Nobody reported hearing it in this period' : 'No reception reports yet'}</Heading>
      <Text tone="muted">
        Reports arrive in two ways: a listening post (a receiver of yours that posts each decode to Faintline with its own token), or a file
        of reports you import. Once a report names this station’s callsign on one of its bands, it shows here.
      </Text>
      {filtered ? <Text tone="muted">Try a longer period or all bands.</Text> : null}
      <View style={styles.links}>
        <TextLink href="/receivers" label="Set up a listening post" />
        <TextLink href="/receivers/import" label="Import a file of reports" />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({ links: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg, marginTop: space.xs } });
