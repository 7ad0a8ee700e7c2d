import { Platform } from 'react-native';
import { JetBrainsMono_400Regular } from '@expo-google-fonts/jetbrains-mono/400Regular';
import { JetBrainsMono_500Medium } from '@expo-google-fonts/jetbrains-mono/500Medium';
import { SpaceGrotesk_400Regular } from '@expo-google-fonts/space-grotesk/400Regular';
import { SpaceGrotesk_500Medium } from '@expo-google-fonts/space-grotesk/500Medium';
import { SpaceGrotesk_700Bold } from '@expo-google-fonts/space-grotesk/700Bold';
import { QueryClientProvider } from '@tanstack/react-query';
import { useFonts } from 'expo-font';
import { Stack, ThemeProvider } from 'expo-router';
import { StatusBar } from 'expo-status-bar';
import { useState } from 'react';
import { SafeAreaProvider } from 'react-native-safe-area-context';
import { enableScreens } from 'react-native-screens';

import { useSessionQuery } from '@/components/auth/queries';
import { createQueryClient } from '@/components/query/query-client';
import { BootScreen } from '@/components/shell/boot-screen';
import { navigationTheme } from '@/components/ui/navigation-theme';
import { useDocumentTitle } from '@/components/ui/use-document-title';
import { AppThemeProvider, useAppTheme } from '@/components/ui/theme-provider';

// In the browser a tab left behind is hidden (display: none) instead of lying under the open one, where screen
// readers, Tab and axe-core still found its headings and controls.
if (Platform.OS === 'web') enableScreens(true);

export { CrashScreen as ErrorBoundary } from '@/components/shell/crash-screen';

// A deep link (e.g. /stations/42) still gets a way back to the overview.
export const unstable_settings = { initialRouteName: '(tabs)' };

export default function RootLayoutRoute() {
  const [queryClient] = useState(createQueryClient);
  const [fontsLoaded, fontError] = useFonts({
    SpaceGrotesk_400Regular,
    SpaceGrotesk_500Medium,
    SpaceGrotesk_700Bold,
    JetBrainsMono_400Regular,
    JetBrainsMono_500Medium,
  });
  return (
    <SafeAreaProvider>
      <QueryClientProvider client={queryClient}>
        <AppThemeProvider>
          {/* On the web the text shows at once in a fallback face and switches when the fonts arrive. */}
          <ThemedRoot fontsReady={Platform.OS === 'web' || fontsLoaded || fontError != null} />
        </AppThemeProvider>
      </QueryClientProvider>
    </SafeAreaProvider>
  );
}

function ThemedRoot({ fontsReady }: { fontsReady: boolean }) {
  const { scheme, colors } = useAppTheme();
  return (
    <ThemeProvider value={navigationTheme(scheme, colors)}>
      <StatusBar style={scheme === 'dark' ? 'light' : 'dark'} />
      <RootStack fontsReady={fontsReady} />
    </ThemeProvider>
  );
}

/** Auth is decided here, once: signed-out people see (auth), signed-in people see (tabs). */
function RootStack({ fontsReady }: { fontsReady: boolean }) {
  const session = useSessionQuery();
  useDocumentTitle();
  if (session.isError) return <BootScreen error={session.error} onRetry={() => session.refetch()} />;
  if (!fontsReady || session.isPending) return <BootScreen />;
  const user = session.data;
  return (
    <Stack screenOptions={{ headerShown: false }}>
      <Stack.Protected guard={!user}>
        <Stack.Screen name="(auth)" />
      </Stack.Protected>
      <Stack.Protected guard={!!user}>
        <Stack.Screen name="(tabs)" />
      </Stack.Protected>
      {/* the invitation link works signed in and signed out (it offers sign-in and comes back) */}
      <Stack.Screen name="join" options={{ title: 'Join a club · Faintline' }} />
      {/* where a device's pairing code is typed; signed out it offers sign-in and keeps the code */}
      <Stack.Screen name="pair" options={{ title: 'Pair a device · Faintline' }} />
      {/* the link mailed to a new sign-in address works signed in and signed out */}
      <Stack.Screen name="confirm-email" options={{ title: 'Confirm your new e-mail · Faintline' }} />
      <Stack.Screen name="+not-found" options={{ title: 'Page not found' }} />
    </Stack>
  );
}
