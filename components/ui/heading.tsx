import { Text, type TextProps, type TextVariant } from './text';

export type HeadingLevel = 1 | 2 | 3 | 4;

const variantOf: Record<HeadingLevel, TextVariant> = { 1: 'title', 2: 'heading', 3: 'heading', 4: 'label' };

export type HeadingProps = Omit<TextProps, 'role' | 'accessibilityRole'> & { level: HeadingLevel };

/**
 * A heading with its level for assistive technology (react-native-web renders h1…h4). A screen has exactly one level 1
 * (its title), sections are level 2, parts of a section level 3.
 */
export function Heading({ level, variant, ...rest }: HeadingProps) {
  return <Text role="heading" aria-level={level} variant={variant ?? variantOf[level]} {...rest} />;
}
