import { type ReactNode } from 'react';
import Svg, { Circle, Path, Rect } from 'react-native-svg';

/** Props every icon takes: stroke colour and edge length in pixels. */
export type IconProps = { color: string; size?: number };

function Frame({ color, size = 24, children }: IconProps & { children: ReactNode }) {
  return (
    <Svg
      width={size}
      height={size}
      viewBox="0 0 24 24"
      fill="none"
      stroke={color}
      strokeWidth={1.8}
      strokeLinecap="round"
      strokeLinejoin="round"
      accessibilityElementsHidden
      importantForAccessibility="no-hide-descendants"
    >
      {children}
    </Svg>
  );
}

/** Baths: an open tank with two hanging electrodes and a liquid line. */
export function BathIcon(props: IconProps) {
  return (
    <Frame {...props}>
      <Path d="M4 8v10a2 2 0 0 0 2 2h12a2 2 0 0 0 2-2V8" />
      <Path d="M6.5 3.5h11" />
      <Path d="M9 3.5v9M15 3.5v9" />
      <Path d="M4 13.5c2.7-1.3 5.3 1.3 8 0s5.3-1.3 8 0" />
    </Frame>
  );
}

/** Calculate: a conical flask with a fill line. */
export function FlaskIcon(props: IconProps) {
  return (
    <Frame {...props}>
      <Path d="M9 3h6" />
      <Path d="M10 3v6.2l-5.3 9.3A1.7 1.7 0 0 0 6.2 21h11.6a1.7 1.7 0 0 0 1.5-2.5L14 9.2V3" />
      <Path d="M7.4 15.5h9.2" />
    </Frame>
  );
}

/** Library: three books lying in a stack. */
export function BooksIcon(props: IconProps) {
  return (
    <Frame {...props}>
      <Rect x={3} y={16} width={18} height={4.5} rx={1} />
      <Rect x={5} y={10.5} width={14} height={5.5} rx={1} />
      <Rect x={4} y={4} width={12} height={6.5} rx={1} />
      <Path d="M7 18.25h4M8.5 13.25h3M7 7.25h3" />
    </Frame>
  );
}

/** Safety: a shield with an upright mark. */
export function ShieldIcon(props: IconProps) {
  return (
    <Frame {...props}>
      <Path d="M12 3l7 2.8v5.4c0 4.4-2.9 8.1-7 9.8-4.1-1.7-7-5.4-7-9.8V5.8z" />
      <Path d="M12 8v4.5" />
      <Path d="M12 15.8v.2" />
    </Frame>
  );
}

/** Account: head and shoulders. */
export function PersonIcon(props: IconProps) {
  return (
    <Frame {...props}>
      <Circle cx={12} cy={8} r={3.8} />
      <Path d="M4.5 20.5c.6-3.9 3.7-6.3 7.5-6.3s6.9 2.4 7.5 6.3" />
    </Frame>
  );
}

/** Warning triangle used beside hazard cautions. */
export function CautionIcon(props: IconProps) {
  return (
    <Frame {...props}>
      <Path d="M10.3 4.2 2.8 17.5A2 2 0 0 0 4.5 20.5h15a2 2 0 0 0 1.7-3L13.7 4.2a2 2 0 0 0-3.4 0z" />
      <Path d="M12 9.5v4.5" />
      <Path d="M12 17.2v.2" />
    </Frame>
  );
}

/** Empty in-tray, for queues with nothing waiting. */
export function TrayIcon(props: IconProps) {
  return (
    <Frame {...props}>
      <Path d="M3.5 13.5 6 5.5h12l2.5 8" />
      <Path d="M3.5 13.5v5a2 2 0 0 0 2 2h13a2 2 0 0 0 2-2v-5h-5a3.5 3.5 0 0 1-7 0z" />
    </Frame>
  );
}

/** A broken trail of dots ending in a question, for pages that do not exist. */
export function LostIcon(props: IconProps) {
  return (
    <Frame {...props}>
      <Circle cx={12} cy={12} r={8.5} />
      <Path d="M9.6 9.6a2.5 2.5 0 1 1 3.4 2.3c-.6.3-1 .8-1 1.5v.6" />
      <Path d="M12 16.8v.2" />
    </Frame>
  );
}
