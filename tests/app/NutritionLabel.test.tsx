import { LabValuesForm } from '@/components/recipes/LabValuesForm';
import { NutritionFactsPanel } from '@/components/recipes/NutritionFactsPanel';
import { ApiError } from '@/lib/api/client';
import { composeRecipe } from '@/lib/nutrition/composition';
import { servingFor } from '@/lib/nutrition/label-rules';
import { buildNutrition } from '@/lib/nutrition/panel';
import { recipe, STRAWBERRY } from '@/tests/fixtures/nutrition';
import { fireEvent, render, screen, waitFor, within } from '@/tests/test-utils';

// The case worked by hand in tests/lib/nutrition.test.ts (USDA SR25 NDB 09316 strawberries, 19335 sugar).
const content = recipe({ lines: [{ ingredientId: 1, amount: 60, unit: 'g-per-l', extractionPct: 100 }] });

const answerFor = (ml: number) =>
  buildNutrition({
    recipeId: 1,
    version: 1,
    recipeName: 'Test',
    bottleName: `${ml} mL`,
    containerMl: ml,
    serving: servingFor(ml),
    servingAskedMl: null,
    composition: composeRecipe(content, ml, new Map([[1, STRAWBERRY]])),
    steeped: false,
    allergens: [],
    lab: null,
    abvLimitPercent: 0.5,
  });

describe('NutritionFactsPanel', () => {
  it('draws one column for a 355 mL bottle with the values worked by hand in tests/lib/nutrition.test.ts', () => {
    render(<NutritionFactsPanel answer={answerFor(355)} basis="asFormulated" label="Nutrition Facts, as formulated" />);
    const panel = within(screen.getByLabelText('Nutrition Facts, as formulated'));
    expect(panel.getByText('1 bottle (355 mL)')).toBeOnTheScreen();
    // 80.70936 kcal/L × 0.355 L = 28.65 → 30; added sugars 12 g/L × 0.355 = 4.26 g → 4 g, 4 / 50 = 8 %.
    expect(panel.getByText('30')).toBeOnTheScreen();
    expect(panel.getByText('Includes 4 g Added Sugars')).toBeOnTheScreen();
    expect(panel.getByText('8%')).toBeOnTheScreen();
    expect(panel.queryByText('Per container')).toBeNull();
  });

  it('draws two columns for a 750 mL bottle (208 % of 360 mL)', () => {
    render(<NutritionFactsPanel answer={answerFor(750)} basis="asFormulated" label="Panel" />);
    const panel = within(screen.getByLabelText('Panel'));
    expect(panel.getByText('12 fl oz (360 mL)')).toBeOnTheScreen();
    expect(panel.getByText('about 2 servings per container')).toBeOnTheScreen();
    expect(panel.getByText('Per container')).toBeOnTheScreen();
    // Calories 80.70936 kcal/L: × 0.36 = 29.06 → 30 per serving; × 0.75 = 60.53 → 60 per container.
    expect(panel.getByText('30')).toBeOnTheScreen();
    expect(panel.getByText('60')).toBeOnTheScreen();
  });
});

describe('LabValuesForm', () => {
  it('refuses a negative value, sends numbers per 100 mL, and puts the server’s message on its field', async () => {
    const onSubmit = jest
      .fn()
      .mockRejectedValueOnce(
        new ApiError(400, 'invalid_input', 'One field needs attention.', { 'per100Ml.sodium': 'Checked twice?' }),
      );
    render(<LabValuesForm version={3} current={null} reference="" onSubmit={onSubmit} error={null} />);
    fireEvent.changeText(screen.getByLabelText('Sodium'), '-4');
    fireEvent.press(screen.getByRole('button', { name: 'Save lab values' }));
    expect(await screen.findByText(/Sodium must be at least 0/)).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
    fireEvent.changeText(screen.getByLabelText('Sodium'), '4,5');
    fireEvent.changeText(screen.getByLabelText('Total Sugars'), '1.2');
    fireEvent.press(screen.getByRole('button', { name: 'Save lab values' }));
    expect(await screen.findByText('Checked twice?')).toBeOnTheScreen();
    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith(
        expect.objectContaining({
          version: 3,
          per100Ml: expect.objectContaining({ sodium: 4.5, totalSugars: 1.2, calories: null }),
        }),
      ),
    );
  });
});
