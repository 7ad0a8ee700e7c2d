import Svg, { Circle, Path } from 'react-native-svg';

export type NavIconName = 'overview' | 'stations' | 'units' | 'health' | 'club' | 'settings';

export type NavIconProps = { name: NavIconName; color: string; size?: number };

/** Line icons of our own, drawn on a 24-unit grid. */
export function NavIcon({ name, color, size = 22 }: NavIconProps) {
  const stroke = { stroke: color, strokeWidth: 1.8, strokeLinecap: 'round' as const, strokeLinejoin: 'round' as const, fill: 'none' };
  return (
    <Svg width={size} height={size} viewBox="0 0 24 24" accessibilityElementsHidden importantForAccessibility="no">
      {name === 'overview' ? (
        <>
          <Path d="M3 17 C 7 17, 8 9, 12 9 S 17 15, 21 7" {...stroke} />
          <Path d="M3 21 H21" {...stroke} strokeOpacity={0.5} />
        </>
      ) : null}
      {name === 'stations' ? (
        <>
          <Path d="M12 10 L8 21 M12 10 L16 21 M9.5 17 H14.5" {...stroke} />
          <Circle cx={12} cy={8} r={1.6} fill={color} />
          <Path d="M8.2 4.6 A5 5 0 0 0 8.2 11.4 M15.8 4.6 A5 5 0 0 1 15.8 11.4" {...stroke} />
        </>
      ) : null}
      {name === 'units' ? (
        <>
          <Path d="M4 7 H20 V17 H4 Z" {...stroke} />
          <Path d="M8 11 H12 V14 H8 Z" {...stroke} />
          <Path d="M15 11 V14 M17.5 11 V14 M7 7 V4.5 M17 7 V4.5 M9 17 V19.5 M15 17 V19.5" {...stroke} strokeOpacity={0.7} />
        </>
      ) : null}
      {name === 'health' ? (
        <>
          <Path d="M4 5 H20 V19 H4 Z" {...stroke} strokeOpacity={0.55} />
          <Path d="M4 12.5 H8.5 L10.5 8.5 L13.5 16 L15.5 12.5 H20" {...stroke} />
        </>
      ) : null}
      {name === 'club' ? (
        <>
          <Circle cx={8.5} cy={8.5} r={3} {...stroke} />
          <Circle cx={16.5} cy={9.5} r={2.4} {...stroke} />
          <Path d="M3 19 C 3.8 15.5, 6 14, 8.5 14 S 13.2 15.5, 14 19 M14.5 14.3 C 17.5 13.6, 20.2 15, 21 18.5" {...stroke} />
        </>
      ) : null}
      {name === 'settings' ? (
        <>
          <Path d="M4 7 H20 M4 12 H20 M4 17 H20" {...stroke} strokeOpacity={0.55} />
          <Circle cx={9} cy={7} r={2} fill={color} />
          <Circle cx={15} cy={12} r={2} fill={color} />
          <Circle cx={7} cy={17} r={2} fill={color} />
        </>
      ) : null}
    </Svg>
  );
}
