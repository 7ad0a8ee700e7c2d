import { StyleSheet, View } from 'react-native';

import type { MessageOnAir } from '@/shared/domain/workshop';

import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { SymbolStrip } from './symbol-strip';

export type MessagePlanProps = {
  plan: { ok: true; messages: MessageOnAir[] } | { ok: false; reason: string };
  /** draw each message's 162 symbols under it */
  showSymbols?: boolean;
};

const typeWords: Record<number, string> = {
  1: 'callsign, 4-character locator and power',
  2: 'callsign with its add-on, and power',
  3: 'callsign code, 6-character locator and power',
};

/** The actual message texts the beacon sends, in the order they alternate. */
export function MessagePlan({ plan, showSymbols = false }: MessagePlanProps) {
  const { colors } = useAppTheme();
  if (!plan.ok)
    return (
      <Text tone="danger" accessibilityRole="alert">
        No message can be made: {plan.reason}
      </Text>
    );
  return (
    <View style={styles.wrap}>
      <Text tone="muted">
        {plan.messages.length === 1
          ? 'Every transmission sends this one message.'
          : `Transmissions alternate between these ${plan.messages.length} messages, one per two-minute slot.`}
      </Text>
      {plan.messages.map((message, index) => (
        <View key={`${message.text}-${index}`} style={[styles.message, { borderColor: colors.border, backgroundColor: colors.background }]}>
          <View style={styles.messageHead}>
            <Text variant="caption" tone="muted">
              {plan.messages.length > 1 ? `Transmission ${index + 1} · ` : ''}Type {message.type}: {typeWords[message.type] ?? ''}
            </Text>
          </View>
          <Text variant="monoLarge" selectable>
            {message.text}
          </Text>
          {showSymbols ? (
            <>
              <SymbolStrip symbols={message.symbols} label={`The 162 symbols of ${message.text}`} />
              <Text variant="caption" tone="muted">
                162 symbols, each one of four tones (0–3), about 110.6 s on the air.
              </Text>
            </>
          ) : null}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  message: { borderWidth: 1, borderRadius: radius.md, padding: space.md, gap: space.xs },
  messageHead: { flexDirection: 'row', flexWrap: 'wrap' },
});
