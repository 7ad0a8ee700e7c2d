import { Platform } from 'react-native';

/** The address a receiver must reach: this page's origin in a browser. */
export function pageOrigin(): string {
  return Platform.OS === 'web' && typeof window !== 'undefined' ? window.location.origin : 'http://127.0.0.1:8080';
}
