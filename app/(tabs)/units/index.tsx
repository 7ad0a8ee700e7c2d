import { useRouter } from 'expo-router';
import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { useStationsQuery } from '@/components/stations/queries';
import { useUnitsQuery } from '@/components/units/queries';
import { UnitList } from '@/components/units/unit-list';
import { filterAndSortUnits, stationsByUnit, type UnitSort } from '@/components/units/unit-summary';
import { useBreakpoints } from '@/components/ui/breakpoints';
import { Button } from '@/components/ui/button';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/query-states';
import { Screen } from '@/components/ui/screen';
import { SegmentedChoice } from '@/components/ui/segmented-choice';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { space } from '@/components/ui/theme';
import { ScreenTitle } from '@/components/ui/screen-title';

export default function UnitsRoute() {
  const router = useRouter();
  const { isTablet } = useBreakpoints();
  const units = useUnitsQuery();
  const stations = useStationsQuery().data;
  const usedBy = useMemo(() => (stations ? stationsByUnit(stations) : undefined), [stations]);
  const [query, setQuery] = useState('');
  const [sort, setSort] = useState<UnitSort>('name');
  const addUnit = () => router.push('/units/new');
  const shown = useMemo(() => filterAndSortUnits(units.data ?? [], query, sort), [units.data, query, sort]);

  let body;
  if (units.isPending) body = <LoadingState label="Loading your units…" />;
  else if (units.isError) body = <ErrorState title="Your units could not be loaded" error={units.error} onRetry={() => units.refetch()} />;
  else if (units.data.length === 0)
    body = (
      <EmptyState
        title="No units yet"
        message="A unit is one beacon board: its clock generator, crystal, filters and antenna. Register one, then give it to a station."
        action={<Button label="Register your first unit" onPress={addUnit} />}
      />
    );
  else
    body = (
      <>
        <View style={styles.tools}>
          <TextField
            label="Find by name or band"
            value={query}
            onChangeText={setQuery}
            placeholder="e.g. loft or 40 m"
            autoCorrect={false}
            style={styles.search}
          />
          <View style={styles.sort}>
            <Text variant="label">Sort by</Text>
            <SegmentedChoice
              label="Sort by"
              value={sort}
              onChange={setSort}
              options={[
                { value: 'name', label: 'Name' },
                { value: 'band', label: 'Lowest band' },
              ]}
            />
          </View>
        </View>
        {shown.length ? (
          <UnitList units={shown} layout={isTablet ? 'table' : 'cards'} usedBy={usedBy} />
        ) : (
          <EmptyState title="No unit matches" message={`None of your units has “${query.trim()}” in its name or filter bands.`} />
        )}
      </>
    );

  return (
    <Screen>
      <View style={styles.head}>
        <View style={styles.titleBlock}>
          <ScreenTitle>Units</ScreenTitle>
          <Text tone="muted">Your beacon hardware register: boards, crystals, filters and antennas.</Text>
        </View>
        {units.data?.length ? <Button label="Register unit" onPress={addUnit} /> : null}
      </View>
      {body}
    </Screen>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-end', justifyContent: 'space-between', gap: space.md },
  titleBlock: { gap: space.xs, flexShrink: 1, minWidth: 200 },
  tools: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: space.md },
  search: { flexGrow: 1, flexBasis: 240 },
  sort: { gap: space.xs },
});
