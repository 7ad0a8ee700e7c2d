import { Link } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';

import { Text } from '../ui/text';
import { useAppTheme } from '../ui/theme-provider';
import { GLOSSARY_TERMS } from './glossary';

/** A small "?" beside a trade word: opens its glossary entry on the Help screen. 44 × 44 px to tap. */
export function TermInfo({ term }: { term: string }) {
  const { colors } = useAppTheme();
  const word = GLOSSARY_TERMS[term];
  if (!word) return null;
  return (
    <Link href={{ pathname: '/help', params: { term } }} asChild>
      <Pressable accessibilityRole="link" accessibilityLabel={`What is “${word}”?`} style={styles.target}>
        <Text variant="label" style={[styles.mark, { color: colors.primary, borderColor: colors.primary }]} aria-hidden>
          ?
        </Text>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  target: { minWidth: 44, minHeight: 44, alignItems: 'center', justifyContent: 'center' },
  mark: { width: 22, height: 22, borderRadius: 11, borderWidth: 1.5, textAlign: 'center', lineHeight: 19, fontSize: 13 },
});
