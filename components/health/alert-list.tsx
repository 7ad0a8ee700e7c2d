import { StyleSheet, View } from 'react-native';

import type { Alert } from '@/shared/schemas';

import { formatUtcDateTime } from '../ui/format';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { ruleTitles } from './words';

export type AlertListProps = { alerts: Alert[]; /** open alerts only, compact (fleet cards and rows) */ compact?: boolean };

/** Alerts in plain words: the rule's title, the server's message, and when it opened (and closed). */
export function AlertList({ alerts, compact = false }: AlertListProps) {
  const { colors } = useAppTheme();
  if (alerts.length === 0) return null;
  return (
    <View style={styles.list}>
      {alerts.map((alert) => {
        const open = alert.resolvedAt === null;
        return (
          <View
            key={alert.id}
            accessibilityRole={open && compact ? 'alert' : undefined}
            style={[
              styles.item,
              compact && styles.compact,
              { borderColor: open ? colors.signal : colors.border, backgroundColor: open ? colors.signalSoft : 'transparent' },
            ]}
          >
            <Text variant="label">
              {ruleTitles[alert.rule] ?? alert.rule}
              {open ? '' : ' · resolved'}
            </Text>
            <Text variant={compact ? 'caption' : 'body'}>{alert.message}</Text>
            {compact ? null : (
              <Text variant="caption" tone="muted">
                Opened {formatUtcDateTime(alert.openedAt)}
                {open ? ` · last seen ${formatUtcDateTime(alert.lastSeenAt)}` : ` · resolved ${formatUtcDateTime(alert.resolvedAt!)}`}
              </Text>
            )}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { borderWidth: 1, borderLeftWidth: 4, borderRadius: radius.md, padding: space.md, gap: 2 },
  compact: { padding: space.sm },
});
