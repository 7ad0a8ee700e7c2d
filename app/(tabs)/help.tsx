import { Stack, useLocalSearchParams } from 'expo-router';

import { HelpView } from '@/components/help/help-view';
import { Screen } from '@/components/ui/screen';

export default function HelpRoute() {
  const { term } = useLocalSearchParams<{ term?: string }>();
  return (
    <Screen>
      <Stack.Screen options={{ title: 'Help · Faintline' }} />
      <HelpView term={typeof term === 'string' ? term : undefined} />
    </Screen>
  );
}
