/**
 * Every signed-in screen and the shell around them, as one module that the routes load on demand (routes.tsx). The
 * sign-in pages never wait for this code: a phone on a weak signal draws them from the first bundle alone.
 */
export { default as BatchByLotScreen } from './BatchByLotScreen';
export { default as BatchesScreen } from './BatchesScreen';
export { default as BatchScreen } from './BatchScreen';
export { default as BottlesScreen } from './BottlesScreen';
export { default as CardCodeScreen } from './CardCodeScreen';
export { default as EditIngredientScreen } from './EditIngredientScreen';
export { default as HomeScreen } from './HomeScreen';
export { default as IngredientScreen } from './IngredientScreen';
export { default as IngredientsScreen } from './IngredientsScreen';
export { default as MoreScreen } from './MoreScreen';
export { default as NewIngredientScreen } from './NewIngredientScreen';
export { default as NewRecipeScreen } from './NewRecipeScreen';
export { default as OutboxScreen } from './OutboxScreen';
export { default as PrintCardScreen } from './PrintCardScreen';
export { default as ProfileScreen } from './ProfileScreen';
export { default as QuickCheckScreen } from './QuickCheckScreen';
export { default as RecipeScreen } from './RecipeScreen';
export { default as RecipesScreen } from './RecipesScreen';
export { default as TeamScreen } from './TeamScreen';
export { AppShell } from '@/components/shell/AppShell';
