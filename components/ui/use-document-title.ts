import { useNavigation, useNavigationContainerRef } from 'expo-router';
import { useEffect, useLayoutEffect, type ReactNode } from 'react';
import { Platform } from 'react-native';

export const PRODUCT_NAME = 'Faintline';
const SEPARATOR = ' · ';

/** "Bands and calibration · Attic beacon" → "Bands and calibration · Attic beacon · Faintline" (the product named once, last). */
export function documentTitle(screenTitle: string | undefined): string {
  if (!screenTitle) return PRODUCT_NAME;
  return screenTitle.endsWith(`${SEPARATOR}${PRODUCT_NAME}`) ? screenTitle : `${screenTitle}${SEPARATOR}${PRODUCT_NAME}`;
}

/**
 * Names the screen in its stack header and (through `useDocumentTitle`) in the browser tab; empty parts are left out.
 * `headerTitle` replaces the header's own heading when the screen shows its title itself.
 */
export function useScreenTitle(parts: (string | null | undefined)[], headerTitle?: (props: { children: string }) => ReactNode) {
  const navigation = useOptionalNavigation();
  const title = parts.filter((part): part is string => !!part).join(SEPARATOR);
  useLayoutEffect(() => {
    if (title && navigation) navigation.setOptions(headerTitle ? { title, headerTitle } : { title });
  }, [navigation, title, headerTitle]);
}

/**
 * The screen's navigation, or null where there is none (component tests render a screen's parts on their own).
 * useNavigation reads its contexts before it throws, so the hooks run in the same order on every render of one tree.
 */
function useOptionalNavigation() {
  try {
    return useNavigation();
  } catch {
    return null;
  }
}

/** On the web, the browser tab shows the focused screen's title (Expo Router leaves the document title alone). */
export function useDocumentTitle() {
  const ref = useNavigationContainerRef();
  useEffect(() => {
    if (Platform.OS !== 'web' || typeof document === 'undefined') return;
    const show = () => {
      const options = ref.isReady() ? (ref.getCurrentOptions() as { title?: string } | undefined) : undefined;
      document.title = documentTitle(options?.title);
    };
    show();
    const offOptions = ref.addListener('options', show);
    const offState = ref.addListener('state', show);
    return () => {
      offOptions();
      offState();
    };
  }, [ref]);
}
