import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card } from '../ui/card';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { Heading } from '../ui/heading';

export type FormSectionProps = { title: string; description?: string; children: ReactNode; action?: ReactNode };

/** One titled group of a long form or screen, drawn as a card. */
export function FormSection({ title, description, children, action }: FormSectionProps) {
  return (
    <Card style={styles.card}>
      <View style={styles.head}>
        <View style={styles.words}>
          <Heading level={2}>{title}</Heading>
          {description ? <Text tone="muted">{description}</Text> : null}
        </View>
        {action}
      </View>
      {children}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: space.lg },
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', justifyContent: 'space-between', gap: space.md },
  words: { gap: space.xs, flexShrink: 1, minWidth: 200 },
});
