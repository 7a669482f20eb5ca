import { BottleFormatForm } from '@/components/bottles/BottleFormatForm';
import { HouseIngredientForm } from '@/components/ingredients/HouseIngredientForm';
import { NewRecipeForm } from '@/components/recipes/NewRecipeForm';
import { BrewerySettingsForm } from '@/components/team/BrewerySettingsForm';
import { InviteForm } from '@/components/team/InviteForm';
import { ApiError } from '@/lib/api/client';
import type { BottleFormat, Organisation } from '@/lib/api/types';
import { fireEvent, render, screen, waitFor } from '@/tests/test-utils';

// Every form: a message beside a bad field and nothing sent; cleaned values sent; the server's field message on its
// field. The messages are the shared yup schemas' own, so these tests also hold the form and the server together.

const serverSays = (fields: Record<string, string>) =>
  new ApiError(400, 'invalid_input', 'One field needs attention.', fields);

describe('BottleFormatForm', () => {
  it('refuses a missing rating and sends numbers as numbers', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    render(<BottleFormatForm onSubmit={onSubmit} onCancel={jest.fn()} error={null} />);
    fireEvent.changeText(screen.getByLabelText('Name'), 'Swing-top 500 mL');
    fireEvent.changeText(screen.getByLabelText('Liquid'), '500');
    fireEvent.changeText(screen.getByLabelText('Headspace'), '25');
    fireEvent.press(screen.getByRole('button', { name: 'Add format' }));
    expect(
      await screen.findByText("Enter the maximum working pressure from the supplier's sheet, in bar."),
    ).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
    fireEvent.changeText(screen.getByLabelText('Maximum working pressure'), '4,5');
    fireEvent.changeText(screen.getByLabelText('Where the pressure figure comes from'), 'Supplier sheet');
    fireEvent.press(screen.getByRole('button', { name: 'Add format' }));
    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith(
        expect.objectContaining({
          name: 'Swing-top 500 mL',
          liquidMl: 500,
          headspaceMl: 25,
          maxWorkingPressureBar: 4.5,
        }),
      ),
    );
  });
});

describe('HouseIngredientForm', () => {
  it('wants the sugars from the label, and puts the server’s message on the name', async () => {
    const onSubmit = jest
      .fn()
      .mockRejectedValue(serverSays({ name: 'You already have an ingredient with this name.' }));
    render(<HouseIngredientForm submitLabel="Add ingredient" onSubmit={onSubmit} error={null} />);
    fireEvent.changeText(screen.getByLabelText('Name'), 'Orchard quince purée');
    fireEvent.changeText(screen.getByLabelText('Serving size'), '100');
    fireEvent.press(screen.getByRole('button', { name: 'Add ingredient' }));
    expect(await screen.findByText('Enter the total sugars per serving (0 if none).')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
    fireEvent.changeText(screen.getByLabelText('Total sugars per serving'), '12');
    fireEvent.press(screen.getByRole('button', { name: 'Add ingredient' }));
    expect(await screen.findByText('You already have an ingredient with this name.')).toBeOnTheScreen();
    expect(onSubmit).toHaveBeenCalledWith(
      expect.objectContaining({ name: 'Orchard quince purée', servingSize: 100, sugarsG: 12 }),
    );
  });
});

describe('InviteForm', () => {
  it('starts as a recipe developer and sends a cleaned address', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    render(<InviteForm onSubmit={onSubmit} error={null} />);
    fireEvent.press(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('Enter your e-mail address.')).toBeOnTheScreen();
    fireEvent.changeText(screen.getByLabelText('E-mail of the person to invite'), ' Wren@Example.TEST ');
    fireEvent.press(screen.getByRole('button', { name: 'Send invitation' }));
    await waitFor(() => expect(onSubmit).toHaveBeenCalledWith({ email: 'wren@example.test', role: 'developer' }));
    // The role stays as chosen for the next invitation; the address clears.
    fireEvent.press(screen.getByRole('radio', { name: /Brewer/ }));
    fireEvent.changeText(screen.getByLabelText('E-mail of the person to invite'), 'juniper@example.test');
    fireEvent.press(screen.getByRole('button', { name: 'Send invitation' }));
    await waitFor(() => expect(onSubmit).toHaveBeenLastCalledWith({ email: 'juniper@example.test', role: 'brewer' }));
    await waitFor(() => expect(screen.getByLabelText('E-mail of the person to invite')).toHaveProp('value', ''));
    expect(screen.getByRole('radio', { name: /Brewer/ })).toBeChecked();
  });
});

describe('BrewerySettingsForm', () => {
  const organisation: Organisation = {
    id: 1,
    name: 'Larkspur Ferments',
    abvLimitPercent: 0.5,
    warmestTempC: 35,
    ratingSharePercent: 80,
    lotPrefix: 'LOT',
    currency: 'USD',
    licensedForAlcohol: false,
  };

  it('refuses a margin over 100 % of the rating and sends the settings as numbers', async () => {
    const onSubmit = jest.fn().mockResolvedValue(undefined);
    render(<BrewerySettingsForm organisation={organisation} onSubmit={onSubmit} error={null} saved={false} />);
    fireEvent.changeText(screen.getByLabelText('Most sugar: share of the bottle rating'), '120');
    fireEvent.press(screen.getByRole('button', { name: 'Save settings' }));
    expect(await screen.findByText('Most sugar: share of the bottle rating must be at most 100 %.')).toBeOnTheScreen();
    expect(onSubmit).not.toHaveBeenCalled();
    fireEvent.changeText(screen.getByLabelText('Most sugar: share of the bottle rating'), '70');
    fireEvent.changeText(screen.getByLabelText('Warmest the bottles may meet'), '38');
    fireEvent.press(screen.getByRole('button', { name: 'Save settings' }));
    await waitFor(() =>
      expect(onSubmit).toHaveBeenCalledWith({
        name: 'Larkspur Ferments',
        abvLimitPercent: 0.5,
        warmestTempC: 38,
        ratingSharePercent: 70,
        lotPrefix: 'LOT',
        currency: 'USD',
        licensedForAlcohol: false,
      }),
    );
  });
});

describe('NewRecipeForm', () => {
  const formats = [
    { id: 7, name: 'Glass crown cap 473 mL', liquidMl: 473, headspaceMl: 25, maxWorkingPressureBar: 3 },
    { id: 8, name: 'Swing-top 750 mL', liquidMl: 750, headspaceMl: 30, maxWorkingPressureBar: 6 },
  ] as BottleFormat[];

  it('names the recipe with the server’s rule and creates it in the chosen bottle', async () => {
    const onCreate = jest.fn().mockResolvedValue(undefined);
    render(<NewRecipeForm formats={formats} onCreate={onCreate} error={null} />);
    fireEvent.changeText(screen.getByLabelText('Recipe name'), 'x');
    fireEvent.press(screen.getByRole('button', { name: 'Create and open the designer' }));
    expect(await screen.findByText('Name the recipe (at least 2 characters).')).toBeOnTheScreen();
    fireEvent.changeText(screen.getByLabelText('Recipe name'), '  Quince and bay  ');
    fireEvent.press(screen.getByRole('radio', { name: 'Swing-top 750 mL' }));
    fireEvent.press(screen.getByRole('radio', { name: 'In the bottle' }));
    fireEvent.press(screen.getByRole('button', { name: 'Create and open the designer' }));
    await waitFor(() => expect(onCreate).toHaveBeenCalled());
    const input = onCreate.mock.calls[0][0];
    expect(input.name).toBe('Quince and bay');
    expect(input.content.bottleFormatId).toBe(8);
    expect(input.content.process.method).toBe('in-bottle');
  });
});
