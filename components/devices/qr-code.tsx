import { create } from 'qrcode';
import { useMemo } from 'react';
import Svg, { Path, Rect } from 'react-native-svg';

export type QrCodeProps = { value: string; sizePx?: number; label: string };

/** A QR code drawn from the qrcode package's module matrix: one SVG path, dark on white, with the quiet zone. */
export default function QrCode({ value, sizePx = 176, label }: QrCodeProps) {
  const { path, size } = useMemo(() => {
    const { modules } = create(value, { errorCorrectionLevel: 'M' });
    let d = '';
    for (let y = 0; y < modules.size; y += 1)
      for (let x = 0; x < modules.size; x += 1) if (modules.get(x, y)) d += `M${x + 4} ${y + 4}h1v1h-1z`;
    return { path: d, size: modules.size + 8 };
  }, [value]);
  return (
    <Svg width={sizePx} height={sizePx} viewBox={`0 0 ${size} ${size}`} accessibilityLabel={label} role="img">
      <Rect x={0} y={0} width={size} height={size} fill="#FFFFFF" />
      <Path d={path} fill="#000000" />
    </Svg>
  );
}
