import { Pressable, StyleSheet, View } from 'react-native';

import type { PairingRequestView, PairingTarget } from '@/shared/schemas';

import { formatUtcDateTime } from '../ui/format';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { EmptyState } from '../ui/query-states';
import { Text } from '../ui/text';
import { TextLink } from '../ui/text-link';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { Heading } from '../ui/heading';

export type PairingReviewProps = {
  request: PairingRequestView;
  selectedId: number | null;
  onSelect: (id: number) => void;
  onApprove: () => void;
  onRefuse: () => void;
  onOtherCode: () => void;
  approving: boolean;
  refusing: boolean;
  error?: string;
};

function Fact({ label, value }: { label: string; value: string }) {
  return (
    <View style={styles.fact}>
      <Text variant="caption" tone="muted">
        {label}
      </Text>
      <Text variant="mono">{value}</Text>
    </View>
  );
}

function TargetChoice({ target, selected, onSelect }: { target: PairingTarget; selected: boolean; onSelect: () => void }) {
  const { colors } = useAppTheme();
  return (
    <Pressable
      role="radio"
      aria-checked={selected}
      onPress={onSelect}
      style={[
        styles.choice,
        { borderColor: selected ? colors.primary : colors.border, backgroundColor: selected ? colors.primarySoft : colors.surface },
      ]}
    >
      <View style={[styles.radio, { borderColor: selected ? colors.primary : colors.textMuted }]}>
        {selected ? <View style={[styles.radioDot, { backgroundColor: colors.primary }]} /> : null}
      </View>
      <View style={styles.choiceText}>
        <Text variant="label">{target.name}</Text>
        <Text variant="caption" tone="muted">
          {target.callsign} · {target.hasToken ? 'has a device now: it would be replaced' : 'no device yet'}
        </Text>
      </View>
    </Pressable>
  );
}

/** Step two of pairing: what is asking, which station it becomes, approve or refuse. */
export function PairingReview({
  request,
  selectedId,
  onSelect,
  onApprove,
  onRefuse,
  onOtherCode,
  approving,
  refusing,
  error,
}: PairingReviewProps) {
  const busy = approving || refusing;
  return (
    <>
      <Card tone="signal">
        <Heading level={2}>A device is asking to be paired</Heading>
        <View style={styles.facts}>
          <Fact label="Code" value={request.userCode} />
          <Fact label="Model" value={request.model ?? 'not given'} />
          <Fact label="Firmware" value={request.firmware ?? 'not given'} />
          <Fact label="Code valid until" value={formatUtcDateTime(request.expiresAtUtc)} />
        </View>
        <Text variant="caption" tone="muted">
          Approve only a device you have in front of you, showing this same code. Someone else&apos;s device would get your station&apos;s
          credentials.
        </Text>
      </Card>

      {error ? <Notice message={error} /> : null}

      {request.targets.length === 0 ? (
        <EmptyState
          title="No station to pair with yet"
          message="A device becomes one of your stations. Add the station first, then type the code again (it lasts 10 minutes)."
          action={<TextLink href="/stations/new" label="Add a station" />}
        />
      ) : (
        <View style={styles.section}>
          <Heading level={2}>Which station is it?</Heading>
          <View accessibilityRole="radiogroup" accessibilityLabel="Station for this device" style={styles.choices}>
            {request.targets.map((target) => (
              <TargetChoice key={target.id} target={target} selected={target.id === selectedId} onSelect={() => onSelect(target.id)} />
            ))}
          </View>
        </View>
      )}

      <View style={styles.actions}>
        <Button
          label="Approve"
          accessibilityLabel="Approve the device"
          onPress={onApprove}
          busy={approving}
          disabled={selectedId === null || refusing}
        />
        <Button
          label="Refuse"
          accessibilityLabel="Refuse the device"
          variant="secondary"
          onPress={onRefuse}
          busy={refusing}
          disabled={busy}
        />
        <Button label="Use another code" variant="ghost" onPress={onOtherCode} disabled={busy} />
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: space.lg, marginVertical: space.xs },
  fact: { gap: 2, minWidth: 120 },
  section: { gap: space.sm },
  choices: { gap: space.sm },
  choice: { flexDirection: 'row', alignItems: 'center', gap: space.md, borderWidth: 1, borderRadius: radius.md, padding: space.md },
  radio: { width: 20, height: 20, borderRadius: 10, borderWidth: 2, alignItems: 'center', justifyContent: 'center' },
  radioDot: { width: 10, height: 10, borderRadius: 5 },
  choiceText: { flex: 1, gap: 2 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
