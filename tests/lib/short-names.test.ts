import { shortIngredientName } from '@/lib/ingredients';

// Long descriptions as USDA SR25 writes them (FOOD_DES.txt, Long_Desc), and the short names a brewer reads. The
// rule is ours: how an ingredient was sold or packed is dropped; what tells two kinds apart is kept.
describe('shortIngredientName', () => {
  it.each([
    ['Cookies, shortbread, commercially prepared, plain', 'Shortbread cookies'], // NDB 18192
    ['Strawberries, raw', 'Strawberries'], // NDB 09316
    ['Strawberries, frozen, unsweetened', 'Frozen strawberries, unsweetened'], // NDB 09318
    ['Spices, cinnamon, ground', 'Ground cinnamon'], // NDB 02010
    ['Spices, pepper, black', 'Black pepper'], // NDB 02030
    ['Syrups, maple', 'Maple syrup'], // NDB 19353
    ['Sugars, granulated', 'Granulated sugar'], // NDB 19335
    ['Sweetener, syrup, agave', 'Agave syrup'], // NDB 19912
    ['Honey', 'Honey'], // NDB 19296
    ['Cherries, sour, red, raw', 'Sour cherries, red'], // NDB 09063
    ['Apple juice, canned or bottled, unsweetened, without added ascorbic acid', 'Unsweetened apple juice'], // NDB 09016
    ['Grapes, red or green (European type, such as Thompson seedless), raw', 'Red or green grapes'], // NDB 09132
    ['Cookies, graham crackers, plain or honey (includes cinnamon)', 'Graham crackers, plain or honey'], // NDB 18173
    ['Milk, whole, 3.25% milkfat, with added vitamin D', 'Whole milk'], // NDB 01077
  ])('%s → %s', (description, short) => {
    expect(shortIngredientName(description)).toBe(short);
  });

  it('keeps kinds apart that differ in more than packing (NDB 01009 and 01260)', () => {
    expect(shortIngredientName('Cheese, cheddar')).not.toBe(shortIngredientName('Cheese, cheddar, reduced fat'));
  });
});
