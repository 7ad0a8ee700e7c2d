import { Platform, StyleSheet } from 'react-native';

import { Text } from '../ui/text';
import { fonts, radius, space } from '../ui/theme';
import { useAppTheme } from '../ui/theme-provider';

export type DownloadLinkProps = { href: string; label: string; fileName?: string };

/** A plain download anchor drawn as a secondary button (the server answers with an attachment). */
export function DownloadLink({ href, label, fileName }: DownloadLinkProps) {
  const { colors } = useAppTheme();
  // react-native-web renders a Text with href as <a>; hrefAttrs adds download
  const web = Platform.OS === 'web' ? ({ href, hrefAttrs: { download: fileName ?? true } } as object) : {};
  return (
    <Text
      accessibilityRole="link"
      accessibilityLabel={label}
      {...web}
      style={[styles.button, { borderColor: colors.primary, color: colors.primary }]}
    >
      {label}
    </Text>
  );
}

const styles = StyleSheet.create({
  button: {
    fontFamily: fonts.medium,
    fontSize: 16,
    lineHeight: 22,
    borderWidth: 1.5,
    borderRadius: radius.md,
    paddingHorizontal: space.lg,
    paddingVertical: 11,
    textAlign: 'center',
    alignSelf: 'flex-start',
  },
});
