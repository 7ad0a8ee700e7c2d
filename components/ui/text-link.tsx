import { Link, type Href } from 'expo-router';
import { Linking, Pressable, StyleSheet } from 'react-native';

import { Text, type TextProps } from './text';

export type TextLinkProps = { href: Href; label: string; variant?: TextProps['variant'] };

/** An in-app link that reads as text. */
export function TextLink({ href, label, variant = 'label' }: TextLinkProps) {
  return (
    <Link href={href} asChild>
      <Pressable accessibilityRole="link" accessibilityLabel={label} style={styles.target}>
        <Text variant={variant} tone="primary" style={styles.text}>
          {label}
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  text: { textDecorationLine: 'underline' },
  // hitSlop does not enlarge what a browser counts as the target, so the link itself is 44 px tall
  target: { minHeight: 44, minWidth: 44, justifyContent: 'center' },
});

export type ServerPageLinkProps = { path: string; label: string; hint?: string };

/** A link to a page the server serves outside the app (opened by the browser, not the router). */
export function ServerPageLink({ path, label, hint }: ServerPageLinkProps) {
  return (
    <Pressable
      accessibilityRole="link"
      accessibilityLabel={label}
      accessibilityHint={hint}
      style={styles.target}
      onPress={() => Linking.openURL(path)}
    >
      <Text variant="label" tone="primary" style={styles.text}>
        {label}
      </Text>
    </Pressable>
  );
}
