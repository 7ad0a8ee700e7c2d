import { StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { linkStateWords, type LinkState } from './words';

export type LinkBadgeProps = { state: LinkState };

/** Online / Offline / No device, as a small pill with a dot (words first, colour second). */
export function LinkBadge({ state }: LinkBadgeProps) {
  const { colors } = useAppTheme();
  const look = {
    online: { bg: colors.primarySoft, fg: colors.primary },
    offline: { bg: colors.dangerSoft, fg: colors.danger },
    'no-device': { bg: 'transparent', fg: colors.textMuted },
  }[state];
  return (
    <View style={[styles.pill, { backgroundColor: look.bg, borderColor: look.fg }]}>
      <View
        style={[
          styles.dot,
          { backgroundColor: look.fg },
          state === 'no-device' && styles.hollow,
          state === 'no-device' && { borderColor: look.fg },
        ]}
      />
      <Text variant="label" style={{ color: look.fg }}>
        {linkStateWords[state]}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  pill: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: space.xs + 2,
    borderWidth: 1,
    borderRadius: radius.pill,
    paddingHorizontal: space.sm + 2,
    paddingVertical: 2,
  },
  dot: { width: 8, height: 8, borderRadius: 4 },
  hollow: { backgroundColor: 'transparent', borderWidth: 1.5 },
});
