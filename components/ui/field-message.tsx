import { Text } from './text';

/** The line under a field: its error in red (announced), else its hint, else nothing. */
export function FieldMessage({ error, hint }: { error?: string; hint?: string }) {
  if (error) {
    return (
      <Text variant="caption" tone="danger" accessibilityRole="alert">
        {error}
      </Text>
    );
  }
  return hint ? (
    <Text variant="caption" tone="muted">
      {hint}
    </Text>
  ) : null;
}
