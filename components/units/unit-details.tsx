import { StyleSheet, View } from 'react-native';

import { filterSelectionLabels, stationPower } from '@/shared/domain/workshop';
import { timeSourceLabels, type Unit } from '@/shared/schemas';

import { Text } from '../ui/text';
import { space } from '../ui/theme';
import { FormSection } from '../form/form-section';
import { formatValue } from '../ui/format';
import { PowerChain } from '../workshop/power-chain';
import { antennaKindLabels, filterTypeLabels } from './unit-form';
import { SupplyFigures } from './supply-figures';
import { bandName, generatorSummary } from './unit-summary';

export type UnitDetailsProps = { unit: Unit };

/** What the register holds about one unit, read-only, with the power arithmetic. */
export function UnitDetails({ unit }: UnitDetailsProps) {
  const drift = unit.disciplined
    ? 'TCXO or GPS-disciplined: holds its frequency'
    : unit.tempCoPpmPerC === null
      ? 'Temperature coefficient not stated'
      : `${unit.tempCoPpmPerC} ppm/°C`;
  return (
    <View style={styles.wrap}>
      <FormSection title="Hardware">
        <Fact label="Serial or label" value={unit.serialLabel || '—'} mono />
        <Fact label="Controller" value={unit.controller || '—'} />
        <Fact label="Time source" value={timeSourceLabels[unit.timeSource]} />
        <Fact label="Generator" value={generatorSummary(unit)} />
        <Fact label="Tolerance" value={`± ${unit.tolerancePpm} ppm`} mono />
        <Fact label="Drift" value={drift} />
        <Fact
          label="Amplifier"
          value={
            unit.amplifier
              ? `${formatValue(unit.amplifier.gainDb, 1, 'dB')} gain, saturates at ${formatValue(unit.amplifier.saturatedDbm, 1, 'dBm')}; supply ${unit.amplifier.supplyV} V, ${unit.amplifier.supplyA} A`
              : 'None'
          }
        />
        <Fact
          label="Antenna"
          value={`${antennaKindLabels[unit.antenna.kind]}, ${formatValue(unit.antenna.gainDbi, 2, 'dBi')}${
            unit.antenna.bands.length ? `, for ${unit.antenna.bands.map(bandName).join(', ')}` : ''
          }`}
        />
      </FormSection>
      <FormSection title="Low-pass filters">
        <Fact label="Selection" value={filterSelectionLabels[unit.filterSelection]} />
        {unit.filters.length === 0 ? (
          <Text tone="danger">No filters: no band can be enabled on this unit.</Text>
        ) : (
          unit.filters.map((filter, index) => (
            <Fact
              key={index}
              label={`Filter ${index + 1}`}
              value={`${filter.bands.map(bandName).join(', ')}: ${filterTypeLabels[filter.type]}, order ${filter.order}, cut-off ${Number((filter.cutoffHz / 1e6).toPrecision(9))} MHz${
                unit.filterSelection === 'switched' && filter.controlCode ? `; control code ${filter.controlCode}` : ''
              }`}
            />
          ))
        )}
      </FormSection>
      <FormSection title="Power at the antenna" description="Stay within the power your licence allows.">
        <PowerChain power={stationPower(unit)} />
        <SupplyFigures power={stationPower(unit)} amplifier={unit.amplifier} />
      </FormSection>
      {unit.notes ? (
        <FormSection title="Notes">
          <Text>{unit.notes}</Text>
        </FormSection>
      ) : null}
    </View>
  );
}

export function Fact({ label, value, mono = false }: { label: string; value: string; mono?: boolean }) {
  return (
    <View style={styles.fact}>
      <Text variant="label" tone="muted" style={styles.factLabel}>
        {label}
      </Text>
      <Text variant={mono ? 'mono' : 'body'} style={styles.factValue}>
        {value}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.lg },
  fact: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.md, rowGap: 2, paddingVertical: 2 },
  factLabel: { width: 128 },
  factValue: { flex: 1, minWidth: 180 },
});
