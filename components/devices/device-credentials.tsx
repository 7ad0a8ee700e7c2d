import { useState, type ReactNode } from 'react';
import { Platform, StyleSheet, View } from 'react-native';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { EmptyState } from '../ui/query-states';
import { Text } from '../ui/text';
import { radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';
import { curlExamples, deviceApiBase } from './device-howto';
import { Heading } from '../ui/heading';
import { ScreenTitle } from '../ui/screen-title';

export type DeviceCredentialsProps = {
  stationName: string;
  hasDevice: boolean;
  /** `Heard 12 s ago`, `Never heard from` */
  heard: string;
  /** the token just issued: shown on this visit only */
  freshToken: string | null;
  readOnly: boolean;
  issuing: boolean;
  error?: string;
  /** the server's address as the device must reach it */
  origin: string;
  onCreate: () => void;
  onRotate: () => void;
  onRevoke: () => void;
  onHideToken: () => void;
  /** pairing by code, offered first; the token below is the fallback */
  pairing?: ReactNode;
};

async function copyText(text: string): Promise<boolean> {
  if (Platform.OS !== 'web' || typeof navigator === 'undefined' || !navigator.clipboard) return false;
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    return false;
  }
}

function FreshToken({ token, onHide }: { token: string; onHide: () => void }) {
  const { colors } = useAppTheme();
  const [copied, setCopied] = useState<'yes' | 'no' | null>(null);
  return (
    <Card tone="signal">
      <Heading level={2}>Your new device token</Heading>
      <Text>Copy it into the device now. You will not see it again: Faintline keeps only a fingerprint of it.</Text>
      <View style={[styles.tokenBox, { backgroundColor: colors.surfaceRaised, borderColor: colors.signal }]}>
        <Text variant="mono" selectable accessibilityLabel="Device token" style={styles.token}>
          {token}
        </Text>
      </View>
      <View style={styles.actions}>
        <Button
          label={copied === 'yes' ? 'Copied' : 'Copy token'}
          onPress={async () => setCopied((await copyText(token)) ? 'yes' : 'no')}
        />
        <Button label="I have stored it" variant="ghost" onPress={onHide} />
      </View>
      {copied === 'no' ? <Notice tone="info" message="This browser did not allow copying: select the token and copy it by hand." /> : null}
    </Card>
  );
}

/** A station's device credentials: create, show once, rotate, revoke, and how a device uses them. */
export function DeviceCredentials({
  stationName,
  hasDevice,
  heard,
  freshToken,
  readOnly,
  issuing,
  error,
  origin,
  onCreate,
  onRotate,
  onRevoke,
  onHideToken,
  pairing,
}: DeviceCredentialsProps) {
  const { colors } = useAppTheme();
  return (
    <>
      <View style={styles.titleBlock}>
        <ScreenTitle>Device token</ScreenTitle>
        <Text tone="muted">
          The beacon at “{stationName}” signs every request with this token. One token per station; replacing it cuts the old one off at
          once.
        </Text>
      </View>
      {error ? <Notice message={error} /> : null}
      {freshToken ? null : pairing}
      {freshToken ? <FreshToken token={freshToken} onHide={onHideToken} /> : null}
      {!hasDevice && !freshToken ? (
        <EmptyState
          title="No device yet"
          message={readOnly ? 'The owner has not created a device token for this station.' : 'Create a token, then give it to the beacon.'}
          action={readOnly ? undefined : <Button label="Create a device token" busy={issuing} onPress={onCreate} />}
        />
      ) : null}
      {hasDevice && !freshToken ? (
        <Card>
          <Text variant="heading">A token is active</Text>
          <Text tone="muted">{heard}. The token itself is not shown again; replace it if it is lost.</Text>
          {readOnly ? (
            <Text variant="caption" tone="muted">
              Only the station's owner manages its device token.
            </Text>
          ) : (
            <View style={styles.actions}>
              <Button
                label="Replace token"
                accessibilityLabel="Replace token of the device"
                variant="secondary"
                busy={issuing}
                onPress={onRotate}
              />
              <Button label="Revoke token" accessibilityLabel="Revoke token of the device" variant="danger" onPress={onRevoke} />
            </View>
          )}
        </Card>
      ) : null}

      <View style={styles.section}>
        <Heading level={2}>How a device talks to Faintline</Heading>
        <Text>
          Every request carries the header <Text variant="mono">Authorization: Bearer &lt;token&gt;</Text>. The configuration, with the plan
          of transmissions, is at:
        </Text>
        <Text variant="mono" selectable style={styles.url}>
          {deviceApiBase(origin)}/config
        </Text>
        <Text tone="muted">With the token in the shell variable FAINTLINE_TOKEN, these are the three calls:</Text>
        {curlExamples(origin).map((example) => (
          <View key={example.title} style={styles.example}>
            <Text variant="label">{example.title}</Text>
            <View style={[styles.code, { backgroundColor: colors.surface, borderColor: colors.border }]}>
              <Text variant="mono" selectable style={styles.codeText}>
                {example.command}
              </Text>
            </View>
          </View>
        ))}
      </View>
    </>
  );
}

/** Long tokens and commands break anywhere instead of running off a phone screen (web only). */
const breakAnywhere = (Platform.OS === 'web' ? { wordBreak: 'break-all' } : {}) as object;

const styles = StyleSheet.create({
  titleBlock: { gap: space.xs },
  tokenBox: { borderWidth: 1, borderRadius: radius.md, padding: space.md },
  token: { fontSize: 15, ...breakAnywhere },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  section: { gap: space.sm },
  url: { ...breakAnywhere },
  example: { gap: space.xs },
  code: { borderWidth: 1, borderRadius: radius.md, padding: space.md },
  codeText: { fontSize: 13, lineHeight: 19, ...breakAnywhere },
});
