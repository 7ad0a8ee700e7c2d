import { Platform, StyleSheet, View } from 'react-native';

import { Text } from '../ui/text';
import { fonts, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type AuditIntroProps = { text: string; csvHref: string };

/** What a log holds, in a sentence, with its CSV download beside it (below it on a phone). */
export function AuditIntro({ text, csvHref }: AuditIntroProps) {
  return (
    <View style={styles.intro}>
      <Text tone="muted" style={styles.introText}>
        {text}
      </Text>
      <CsvLink href={csvHref} />
    </View>
  );
}

export type CsvLinkProps = { href: string; label?: string };

/** A plain anchor to the CSV download (the server answers with an attachment). */
export function CsvLink({ href, label = 'Download CSV' }: CsvLinkProps) {
  const { colors } = useAppTheme();
  const web = Platform.OS === 'web' ? ({ href, hrefAttrs: { download: true } } as object) : {};
  return (
    <Text
      accessibilityRole="link"
      accessibilityLabel={label}
      {...web}
      style={[styles.csv, { borderColor: colors.primary, color: colors.primary }]}
    >
      {label}
    </Text>
  );
}

const styles = StyleSheet.create({
  intro: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: space.md },
  introText: { flex: 1, minWidth: 220 },
  csv: {
    fontFamily: fonts.medium,
    fontSize: 16,
    lineHeight: 22,
    borderWidth: 1.5,
    borderRadius: radius.md,
    paddingHorizontal: space.lg,
    paddingVertical: 10,
    textAlign: 'center',
    alignSelf: 'flex-start',
  },
});
