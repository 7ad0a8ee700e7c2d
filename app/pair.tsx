import { router, Stack, useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { AuthShell } from '@/components/auth/auth-shell';
import { SignInOrRegister } from '@/components/auth/sign-in-or-register';
import { useSessionQuery } from '@/components/auth/queries';
import { Wordmark } from '@/components/brand/faintline-mark';
import { PairCodeFormView } from '@/components/devices/pair-code-form';
import { PairingOutcome } from '@/components/devices/pairing-outcome';
import { PairingReview } from '@/components/devices/pairing-review';
import {
  useApprovePairingMutation,
  useLookUpPairing,
  usePairingRequestQuery,
  useRefusePairingMutation,
} from '@/components/devices/queries';
import { ConfirmDialog } from '@/components/ui/confirm-dialog';
import { LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { TextLink } from '@/components/ui/text-link';
import { layout, space } from '@/components/ui/theme';
import { formatUserCode, isUserCode, type PairingDecision } from '@/shared/schemas';
import { ScreenTitle } from '@/components/ui/screen-title';

const TITLE = 'Pair a device · Faintline';

/**
 * /pair[?code=BCDF-GHJK]: where a device's verification_uri points. Works signed out too: sign in
 * (or register) right here and carry on with the code kept.
 */
export default function PairRoute() {
  const { code } = useLocalSearchParams<{ code?: string }>();
  const initialCode = typeof code === 'string' && isUserCode(code) ? formatUserCode(code) : typeof code === 'string' ? code : '';
  const user = useSessionQuery().data ?? null;

  if (!user) {
    return (
      <>
        <Stack.Screen options={{ title: TITLE }} />
        <AuthShell
          title="Pair a device"
          intro={`Sign in to give the device one of your stations. You come straight back here${initialCode ? `, with the code ${initialCode} kept` : ''}.`}
        >
          <SignInOrRegister />
        </AuthShell>
      </>
    );
  }
  return <SignedInPairing initialCode={initialCode} />;
}

function SignedInPairing({ initialCode }: { initialCode: string }) {
  const lookUp = useLookUpPairing();
  const [activeCode, setActiveCode] = useState<string | null>(null);
  const [selectedId, setSelectedId] = useState<number | null>(null);
  const [confirming, setConfirming] = useState(false);
  const [decision, setDecision] = useState<PairingDecision | null>(null);
  const request = usePairingRequestQuery(activeCode);
  const approve = useApprovePairingMutation();
  const refuse = useRefusePairingMutation();

  const find = async (typed: string) => {
    const userCode = formatUserCode(typed);
    const found = await lookUp(userCode);
    setSelectedId(found.targets.length === 1 ? found.targets[0].id : null);
    setDecision(null);
    setActiveCode(userCode);
  };
  const start = () => {
    setActiveCode(null);
    setDecision(null);
    setSelectedId(null);
    approve.reset();
    refuse.reset();
    router.setParams({ code: undefined });
  };
  const target = request.data?.targets.find((t) => t.id === selectedId);
  const doApprove = () => {
    if (!activeCode || selectedId === null) return;
    approve.mutate(
      { userCode: activeCode, targetId: selectedId },
      {
        onSuccess: (result) => {
          setConfirming(false);
          setDecision(result);
        },
      },
    );
  };

  let body;
  if (decision) body = <PairingOutcome decision={decision} onAnother={start} />;
  else if (!activeCode)
    body = (
      <View style={styles.form}>
        <Text>
          Start pairing on the device: it shows (or prints on its serial console) a code of 8 letters. Type it here, then choose which of
          your stations the device is. It receives its own token by itself; nothing to copy.
        </Text>
        <PairCodeFormView initialCode={initialCode} onLookup={find} />
      </View>
    );
  else if (!request.data) body = <LoadingState label="Looking the code up…" />;
  else
    body = (
      <PairingReview
        request={request.data}
        selectedId={selectedId}
        onSelect={setSelectedId}
        onApprove={() => (target?.hasToken ? setConfirming(true) : doApprove())}
        onRefuse={() => refuse.mutate(activeCode, { onSuccess: setDecision })}
        onOtherCode={start}
        approving={approve.isPending && !confirming}
        refusing={refuse.isPending}
        error={confirming ? undefined : (approve.error?.message ?? refuse.error?.message)}
      />
    );

  return (
    <Screen
      maxWidth={layout.maxFormWidth + 160}
      overlay={
        <ConfirmDialog
          visible={confirming}
          title={`Replace the device of ${target?.name ?? 'this station'}?`}
          message="The station's current device token stops working at once: the old device goes quiet, and this one takes its place."
          confirmLabel="Approve and replace"
          destructive
          busy={approve.isPending}
          error={approve.error?.message}
          onCancel={() => {
            setConfirming(false);
            approve.reset();
          }}
          onConfirm={doApprove}
        />
      }
    >
      <Stack.Screen options={{ title: TITLE }} />
      <View style={styles.head}>
        <Wordmark />
        <ScreenTitle style={styles.title}>Pair a device</ScreenTitle>
        <TextLink href="/stations" label="Back to your stations" />
      </View>
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { gap: space.xs },
  title: { marginTop: space.md },
  form: { gap: space.lg },
});
