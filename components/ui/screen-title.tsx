import { Heading, type HeadingProps } from './heading';
import { HeaderLabel } from './stack-options';
import { useScreenTitle } from './use-document-title';

export type ScreenTitleProps = Omit<HeadingProps, 'level' | 'children'> & {
  children: string;
  /** What the screen is about, when the title alone does not say it (the station's name on "Bands and calibration"). */
  context?: string | null;
};

/** A screen's one level-1 heading; it also names the screen in the stack header and the browser tab. */
export function ScreenTitle({ children, context, ...rest }: ScreenTitleProps) {
  useScreenTitle([children, context], HeaderLabel);
  return (
    <Heading level={1} {...rest}>
      {children}
    </Heading>
  );
}
