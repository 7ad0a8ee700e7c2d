import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Wordmark } from '../brand/faintline-mark';
import { Card } from '../ui/card';
import { Screen } from '../ui/screen';
import { Text } from '../ui/text';
import { layout, space } from '../ui/theme';
import { ScreenTitle } from '../ui/screen-title';

export type AuthShellProps = { title: string; intro?: string; children: ReactNode; footer?: ReactNode };

/** The frame of the signed-out screens: the mark, a short line about the product, and one card. */
export function AuthShell({ title, intro, children, footer }: AuthShellProps) {
  return (
    <Screen maxWidth={layout.maxFormWidth} contentStyle={styles.column}>
      <View style={styles.brand}>
        <Wordmark size="large" />
        <Text tone="muted">Plan, tune and look after your low-power WSPR beacons.</Text>
      </View>
      <Card style={styles.card}>
        <ScreenTitle>{title}</ScreenTitle>
        {intro ? <Text tone="muted">{intro}</Text> : null}
        <View style={styles.body}>{children}</View>
      </Card>
      {footer ? <View style={styles.footer}>{footer}</View> : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  column: { paddingTop: space.xl },
  brand: { gap: space.sm, marginBottom: space.sm },
  card: { padding: space.xl, gap: space.md },
  body: { gap: space.lg, marginTop: space.sm },
  footer: { gap: space.md, alignItems: 'flex-start', paddingHorizontal: space.xs },
});
