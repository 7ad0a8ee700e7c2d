import { Stack } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { FaintlineMark } from '@/components/brand/faintline-mark';
import { Card } from '@/components/ui/card';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { layout, space } from '@/components/ui/theme';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function NotFoundRoute() {
  return (
    <Screen maxWidth={layout.maxFormWidth} contentStyle={styles.column}>
      <Stack.Screen options={{ title: 'Page not found · Faintline' }} />
      <Card style={styles.card}>
        <FaintlineMark size={48} />
        <ScreenTitle>Nothing on this frequency</ScreenTitle>
        <Text tone="muted">The page you asked for does not exist, or it has moved.</Text>
        <View style={styles.link}>
          <TextLink href="/" label="Go to the overview" />
        </View>
      </Card>
    </Screen>
  );
}

const styles = StyleSheet.create({
  column: { paddingTop: space.xxxl },
  card: { padding: space.xl, gap: space.md },
  link: { marginTop: space.sm },
});
