import { useLocalSearchParams } from 'expo-router';

import { LazyHelpView } from '@/components/help/lazy-help';
import { Screen } from '@/components/ui/screen';
import { ScreenTitle } from '@/components/ui/screen-title';
import { Text } from '@/components/ui/text';

export default function HelpRoute() {
  const { term } = useLocalSearchParams<{ term?: string }>();
  return (
    <Screen>
      <ScreenTitle>Help</ScreenTitle>
      <Text tone="muted">
        How a beacon goes from a board on the bench to reports from far away, and what the words on the screens mean.
      </Text>
      <LazyHelpView term={typeof term === 'string' ? term : undefined} />
    </Screen>
  );
}
