import { StyleSheet, View } from 'react-native';

import type { Unit } from '@/shared/schemas';

import { Button } from '../ui/button';
import { Notice } from '../ui/notice';
import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { FormSection } from '../form/form-section';
import { useFittedFilterMutation } from './queries';
import { bandName } from './unit-summary';

const utc = (iso: string) => `${iso.slice(0, 16).replace('T', ' ')} UTC`;

/** For hand-swapped filters: which one is in the unit now, and one press to record a swap. */
export function FittedFilterCard({ unit, readOnly }: { unit: Unit; readOnly: boolean }) {
  const fit = useFittedFilterMutation(unit.id);
  if (unit.filterSelection !== 'hand') return null;
  const fitted = unit.fittedFilter;
  const name = (index: number) => `${unit.filters[index].bands.map(bandName).join('/')} filter`;
  return (
    <FormSection
      title="Fitted filter"
      description="This unit’s filters are swapped by hand: only the band of the filter fitted now can be scheduled. Record each swap as you make it."
    >
      <Text variant="label" accessibilityLabel="Fitted now">
        {fitted ? `Fitted now: the ${name(fitted.index)} (recorded ${utc(fitted.atUtc)})` : 'No filter is recorded as fitted yet.'}
      </Text>
      {readOnly ? null : unit.filters.length === 0 ? (
        <Text tone="muted">Add filters to the unit first.</Text>
      ) : (
        <View style={styles.buttons}>
          {unit.filters.map((filter, index) =>
            fitted?.index === index ? null : (
              <Button
                key={index}
                variant="secondary"
                label={`I fitted the ${name(index)}`}
                busy={fit.isPending && fit.variables === index}
                onPress={() => fit.mutate(index)}
              />
            ),
          )}
        </View>
      )}
      {fit.error ? <Notice message={fit.error.message} /> : null}
      <Text variant="caption" tone="muted">
        Switch the beacon off before swapping a filter, and never transmit with no filter fitted.
      </Text>
    </FormSection>
  );
}

const styles = StyleSheet.create({ buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm } });
