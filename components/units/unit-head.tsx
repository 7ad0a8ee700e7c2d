import { StyleSheet, View } from 'react-native';

import type { Unit } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { generatorSummary } from './unit-summary';
import { ScreenTitle } from '../ui/screen-title';

export type UnitHeadProps = {
  unit: Unit;
  /** Someone else's unit (a club admin looking): no actions, and it says whose it is. */
  readOnly: boolean;
  copying: boolean;
  copyError?: string;
  onEdit: () => void;
  onCopy: () => void;
  onDelete: () => void;
};

/** The unit screen's title, its generator in one line, and what the owner can do with it. */
export function UnitHead({ unit, readOnly, copying, copyError, onEdit, onCopy, onDelete }: UnitHeadProps) {
  return (
    <>
      <View style={styles.head}>
        <View style={styles.titleBlock}>
          <ScreenTitle>{unit.name}</ScreenTitle>
          <Text variant="mono" tone="primary">
            {generatorSummary(unit)}
            {unit.serialLabel ? ` · ${unit.serialLabel}` : ''}
          </Text>
        </View>
        {readOnly ? null : (
          <View style={styles.actions}>
            <Button label="Edit" variant="secondary" accessibilityLabel={`Edit ${unit.name}`} onPress={onEdit} />
            <Button label="Copy unit" variant="secondary" busy={copying} onPress={onCopy} />
            <Button label="Delete" variant="danger" accessibilityLabel={`Delete ${unit.name}`} onPress={onDelete} />
          </View>
        )}
      </View>
      {copyError ? <Notice message={copyError} /> : null}
      {readOnly ? (
        <Card tone="signal">
          <Text variant="label">Read-only: this unit belongs to {unit.ownerName}</Text>
        </Card>
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  titleBlock: { gap: space.xs, flexShrink: 1 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
