import type { ReactNode } from 'react';
import { View, type StyleProp, type ViewStyle } from 'react-native';

type Props = { children: ReactNode; style?: StyleProp<ViewStyle>; 'aria-label'?: string };

/** A list for assistive technology: its direct children are `ListItem`s (a row that is a link or button sits inside one). */
export function List({ children, style, 'aria-label': label }: Props) {
  return (
    <View role="list" aria-label={label} style={style}>
      {children}
    </View>
  );
}

/** One entry of a `List`; it may carry a spoken summary of the row in `aria-label`. */
export function ListItem({ children, style, 'aria-label': label }: Props) {
  return (
    <View role="listitem" aria-label={label} style={style}>
      {children}
    </View>
  );
}
