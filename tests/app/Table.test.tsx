import { Text } from 'react-native';

import { Table } from '@/components/ui';
import { render, screen } from '@/tests/test-utils';

const rows = [
  { id: 1, name: 'Hop Garden', count: 3 },
  { id: 2, name: 'Still Room', count: 5 },
];
const columns = [
  { key: 'name', header: 'Name', render: (r: (typeof rows)[number]) => r.name },
  { key: 'count', header: 'Count', render: (r: (typeof rows)[number]) => <Text>{`${r.count} bottles`}</Text> },
];

function setWidth(width: number) {
  jest
    .spyOn(require('react-native'), 'useWindowDimensions')
    .mockReturnValue({ width, height: 800, scale: 1, fontScale: 1 });
}

afterEach(() => jest.restoreAllMocks());

describe('Table', () => {
  it('is a table with one header row on wide windows', () => {
    setWidth(1200);
    render(<Table label="Rooms" columns={columns} rows={rows} rowKey={(r) => r.id} />);
    expect(screen.getAllByText('Name')).toHaveLength(1);
    expect(screen.getByText('Still Room')).toBeOnTheScreen();
    expect(screen.getByText('5 bottles')).toBeOnTheScreen();
  });

  it('becomes one card per row, each with its own labels, on phones', () => {
    setWidth(390);
    render(<Table label="Rooms" columns={columns} rows={rows} rowKey={(r) => r.id} />);
    expect(screen.getAllByText('Name')).toHaveLength(2);
    expect(screen.getAllByText('Count')).toHaveLength(2);
  });
});
