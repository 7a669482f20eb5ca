import Svg, { Circle, Path } from 'react-native-svg';

export type IconName =
  'home' | 'team' | 'mail' | 'person' | 'signOut' | 'gauge' | 'bottle' | 'leaf' | 'more' | 'flask' | 'batch';

/** Line icons drawn for Fizzwright on a 24-unit grid; decorative, so hidden from screen readers. */
const paths: Record<IconName, { d: string[]; circles?: [number, number, number][] }> = {
  home: { d: ['M4 11l8-7 8 7', 'M6 10v10h12V10', 'M10 20v-5h4v5'] },
  team: {
    d: ['M3 20c0-3 3-5 6-5s6 2 6 5', 'M15 15c3 0 6 2 6 5'],
    circles: [
      [9, 9, 3.2],
      [16.5, 9.5, 2.6],
    ],
  },
  mail: { d: ['M3 6h18v12H3z', 'M3 7l9 6 9-6'] },
  person: { d: ['M5 20c0-4 3-6 7-6s7 2 7 6'], circles: [[12, 8, 3.6]] },
  signOut: { d: ['M14 4H5v16h9', 'M10 12h10', 'M17 8l4 4-4 4'] },
  flask: { d: ['M9 3h6', 'M10 3v6L5 19a1 1 0 0 0 1 1.5h12a1 1 0 0 0 1-1.5L14 9V3', 'M7.5 15h9'] },
  leaf: { d: ['M5 19c0-8 5-14 15-14 0 10-6 15-14 15', 'M5 19l8-8'] },
  more: {
    d: [],
    circles: [
      [5, 12, 1.6],
      [12, 12, 1.6],
      [19, 12, 1.6],
    ],
  },
  batch: { d: ['M4 4h16v16H4z', 'M8 9h8', 'M8 13h8', 'M8 17h5'] },
  bottle: { d: ['M10 3h4v4c2 1 3 3 3 5v8a1 1 0 0 1-1 1H8a1 1 0 0 1-1-1v-8c0-2 1-4 3-5V3z', 'M7 13h10'] },
  gauge: {
    d: ['M4.5 17a8.5 8.5 0 1 1 15 0', 'M12 15l4-5', 'M7 12.5h1', 'M12 7.5v1', 'M16.5 12.5h1'],
    circles: [[12, 15, 1.6]],
  },
};

export function Icon({ name, color, size = 24 }: { name: IconName; color: string; size?: number }) {
  const { d, circles = [] } = paths[name];
  return (
    <Svg
      width={size}
      height={size}
      viewBox="0 0 24 24"
      fill="none"
      accessibilityElementsHidden
      importantForAccessibility="no-hide-descendants"
    >
      {d.map((path) => (
        <Path key={path} d={path} stroke={color} strokeWidth={1.9} strokeLinecap="round" strokeLinejoin="round" />
      ))}
      {circles.map(([cx, cy, r]) => (
        <Circle key={`${cx}-${cy}`} cx={cx} cy={cy} r={r} stroke={color} strokeWidth={1.9} />
      ))}
    </Svg>
  );
}
