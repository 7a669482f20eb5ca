import { RecipeEditor } from '@/components/recipes/RecipeEditor';
import type { BottleFormat, RecipeDetail } from '@/lib/api/types';
import { fireEvent, render, screen, waitFor } from '@/tests/test-utils';

// The numbers come from the API, which is not there in a component test: the save bar does not need them.
jest.mock('@/lib/api/client', () => {
  const actual = jest.requireActual('@/lib/api/client');
  return {
    ...actual,
    api: {
      ...actual.api,
      post: () => Promise.reject(new Error('offline')),
      get: () => Promise.reject(new Error('offline')),
    },
  };
});

const format = {
  id: 9,
  name: 'Glass crown cap 473 mL',
  liquidMl: 473,
  headspaceMl: 25,
  maxWorkingPressureBar: 3,
  closure: 'crown-cap',
  material: 'glass',
  pressureSource: 'Supplier sheet',
  notes: null,
  archived: false,
} as BottleFormat;
const recipe = {
  id: 4,
  name: 'Quince and bay',
  flavourNotes: '',
  status: 'draft',
  currentVersion: 3,
  submittedVersion: null,
  approvedVersion: null,
  updatedAt: '2026-12-01T10:00:00.000Z',
  version: 3,
  versionNote: '',
  savedBy: 'Rafi Castellan',
  savedAt: '2026-12-01T10:00:00.000Z',
  ingredientNames: {},
  content: {
    baseBrew: {
      name: 'House base',
      residualSugarGPerL: 1,
      ph: 3.2,
      abvPercent: 0.05,
      residualCo2Volumes: null,
      lastOpenTempC: 21,
    },
    lines: [],
    sugars: [{ type: 'sucrose', gPerL: 2 }],
    process: {
      method: 'in-bottle',
      steepHours: 0,
      steepTempC: 4,
      strainLossPct: 0,
      carbonateHours: 72,
      carbonateTempC: 22,
      coldStoreTempC: 4,
    },
    bottleFormatId: 9,
    targetVolumes: 2,
    sweetnessNote: '',
    highestTempC: 25,
  },
} as RecipeDetail;

describe('the designer’s save bar', () => {
  it('says when there are unsaved changes and saves them as the next version of the one edited', async () => {
    const onSave = jest.fn().mockResolvedValue(undefined);
    render(
      <RecipeEditor
        recipe={recipe}
        formats={[format]}
        units="metric"
        limitPercent={0.5}
        canEdit
        onSave={onSave}
        saveError={null}
        onReload={jest.fn()}
      />,
    );
    expect(screen.getByText('Version 3')).toBeOnTheScreen();
    expect(screen.getByRole('button', { name: 'Save as new version' })).toBeDisabled();
    fireEvent.changeText(screen.getByLabelText('Sucrose (table sugar) per litre'), '3');
    expect(await screen.findByText('Version 3 · unsaved changes')).toBeOnTheScreen();
    fireEvent.press(screen.getByRole('button', { name: 'Save as new version' }));
    await waitFor(() => expect(onSave).toHaveBeenCalled());
    expect(onSave.mock.calls[0][0]).toMatchObject({
      name: 'Quince and bay',
      baseVersion: 3,
      content: { sugars: [{ type: 'sucrose', gPerL: 3 }] },
    });
  });

  it('is not there for someone who cannot edit', () => {
    render(
      <RecipeEditor
        recipe={recipe}
        formats={[format]}
        units="metric"
        limitPercent={0.5}
        canEdit={false}
        onSave={jest.fn()}
        saveError={null}
        onReload={jest.fn()}
      />,
    );
    expect(screen.queryByRole('button', { name: 'Save as new version' })).toBeNull();
  });
});
