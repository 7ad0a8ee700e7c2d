import { useState } from 'react';
import { View } from 'react-native';
import Svg, { Rect } from 'react-native-svg';

import { useAppTheme } from '../ui/theme-provider';

export type SymbolStripProps = { symbols: readonly number[]; label: string };

const HEIGHT = 48;

/** The 162 channel symbols of one message as columns, each as tall as its value 0–3. */
export function SymbolStrip({ symbols, label }: SymbolStripProps) {
  const { colors } = useAppTheme();
  const [width, setWidth] = useState(324);
  const column = width / symbols.length;
  return (
    <View
      onLayout={(event) => setWidth(Math.max(162, Math.round(event.nativeEvent.layout.width)))}
      accessibilityRole="image"
      accessibilityLabel={label}
    >
      <Svg width={width} height={HEIGHT}>
        <Rect x={0} y={0} width={width} height={HEIGHT} fill={colors.background} rx={4} />
        {symbols.map((value, index) => {
          const height = ((value + 1) / 4) * (HEIGHT - 6);
          return (
            <Rect
              key={index}
              x={index * column + column * 0.12}
              y={HEIGHT - 3 - height}
              width={Math.max(0.6, column * 0.76)}
              height={height}
              fill={value >= 2 ? colors.primary : colors.signal}
              opacity={value % 2 === 1 ? 1 : 0.65}
            />
          );
        })}
      </Svg>
    </View>
  );
}
