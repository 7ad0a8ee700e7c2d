import type { ErrorBoundaryProps } from 'expo-router';

import { ErrorState } from '../ui/query-states';
import { Screen } from '../ui/screen';
import { layout } from '../ui/theme';
import { AppThemeProvider } from '../ui/theme-provider';

/** Shown when a screen throws while rendering; brings its own theme, since providers may be gone. */
export function CrashScreen({ error, retry }: ErrorBoundaryProps) {
  return (
    <AppThemeProvider>
      <Screen maxWidth={layout.maxFormWidth}>
        <ErrorState title="This screen stopped working" error={error} onRetry={() => retry()} />
      </Screen>
    </AppThemeProvider>
  );
}
