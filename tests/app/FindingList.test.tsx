import { FindingList } from '@/components/ui/calculations/FindingList';
import { computeCarbonation } from '@/lib/chemistry/carbonation';
import { render, screen } from '@/tests/test-utils';

describe('FindingList', () => {
  it('puts danger first and says each level in words, not only colour', () => {
    const { findings } = computeCarbonation({
      liquidMl: 500,
      headspaceMl: 25,
      sugars: [{ type: 'sucrose', grams: 2 }],
      ingredients: [],
      residualCo2Volumes: 0.8,
      sealedTempC: 20,
      temperaturesC: [4, 20, 40],
      maxWorkingPressureBar: 3,
      baseAbvPercent: 0,
      yield: 'worst',
      abvLimitPercent: 0.5,
      solidsInBottle: true,
    });
    render(<FindingList findings={findings} />);
    const items = screen.getAllByLabelText(/^(Danger|Caution|OK): /);
    expect(items[0]).toHaveProp('aria-label', expect.stringMatching(/^Danger: Worst case .* bar .* at 40 °C/));
    expect(items[items.length - 1]).toHaveProp('aria-label', expect.stringMatching(/^(Caution|OK): /));
    expect(screen.getAllByText('Caution').length).toBeGreaterThan(0);
    expect(screen.getByText(/Fruit, purée or other solids stay in the bottle/)).toBeOnTheScreen();
  });
});
