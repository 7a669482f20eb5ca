import type { CarbonationResult, PrimingResult } from '@/lib/chemistry/carbonation';
import type { Allergen, Category, LabelNutrientValues, Measure } from '@/lib/ingredients';
import type { Role } from '@/lib/roles';
import type { BottleFormatInput } from '@/lib/schemas/bottle-formats';
import type { RecipeContent, TastingInput } from '@/lib/schemas/recipes';
import type { ReviewState } from '@/lib/schemas/reviews';
import type { UnitSystem } from '@/lib/units';

/** The uniform error body every API error carries. */
export interface ErrorBody {
  error: { code: string; message: string; fields?: Record<string, string> };
}

export interface Organisation {
  id: number;
  name: string;
  /** The brewery's line between non-alcoholic and alcoholic, % ABV. */
  abvLimitPercent: number;
  /** The warmest the brewery's bottles may meet, °C: every pressure check includes it. */
  warmestTempC: number;
  /** The share of a bottle's rating the most sugar may reach at the warm check, %. */
  ratingSharePercent: number;
  /** Printed at the start of every lot code. */
  lotPrefix: string;
  /** ISO 4217 code of the currency ingredient costs are kept in. */
  currency: string;
  /** Declared by an owner: licensed to make alcoholic beverages (versions at or over the limit may then be approved). */
  licensedForAlcohol: boolean;
}

export interface SessionUser {
  id: number;
  name: string;
  email: string;
  role: Role;
  unitSystem: UnitSystem;
  /** Whether review e-mails reach this person. */
  notifyReviews: boolean;
}

export interface Session {
  user: SessionUser;
  organisation: Organisation;
}

export interface Member {
  id: number;
  name: string;
  email: string;
  role: Role;
  active: boolean;
  createdAt: string;
}

export type InvitationStatus = 'pending' | 'expired' | 'accepted' | 'revoked';

export interface Invitation {
  id: number;
  email: string;
  role: Role;
  status: InvitationStatus;
  expiresAt: string;
  invitedBy: string | null;
  createdAt: string;
}

export interface Team {
  members: Member[];
  invitations: Invitation[];
}

export interface InvitationPreview {
  email: string;
  role: Role;
  breweryName: string;
  invitedBy: string | null;
}

export interface OutboxMessage {
  id: number;
  to: string;
  subject: string;
  text: string;
  kind: string;
  createdAt: string;
}

export interface ServerInfo {
  status: 'ok';
  db: 'ok';
  /** The database this instance uses: one SQLite file, or PostgreSQL shared by several instances. */
  dialect: 'sqlite' | 'postgres';
  /** Where attached files are kept: a configured S3 bucket, or the local S3-compatible fake on loopback. */
  storage: { kind: 's3' | 'local'; bucket: string };
  version: string;
  /** True when e-mail goes to the local Mail outbox instead of a real mail server. */
  outbox: boolean;
  /** True when anyone, signed in or not, may read the outbox (development only). */
  outboxOpen: boolean;
}

export interface BottleFormat extends BottleFormatInput {
  id: number;
  archived: boolean;
}

/** An ingredient as the API answers it: values per 100 g and per gram, with where they come from. */
export interface Ingredient {
  id: number;
  scope: 'dataset' | 'house';
  /** The full name: the dataset's description, or the house ingredient's name. */
  name: string;
  /** The name people read in lists, recipes and cards: the brewery's short name, or one made from the description. */
  displayName: string;
  category: Category;
  per100g: {
    energyKcal: number | null;
    carbohydrateG: number | null;
    sugarsG: number | null;
    fibreG: number | null;
    fatG: number | null;
    proteinG: number | null;
  };
  /** What a nutrition panel needs besides, per 100 g (null: not measured). */
  labelPer100g: LabelNutrientValues;
  perGram: { sugarsG: number | null; fermentableSugarsG: number | null; fatG: number | null };
  fermentableSharePct: number;
  steepSharePct: number;
  allergens: Allergen[];
  measures: Measure[];
  costPerKg: number | null;
  notes: string | null;
  source: string;
  archived: boolean;
}

export interface Attachment {
  id: number;
  name: string;
  mimeType: string;
  sizeBytes: number;
  uploadedBy: string | null;
  createdAt: string;
  url: string;
}

export interface RecipeSummary {
  id: number;
  name: string;
  flavourNotes: string;
  status: 'draft' | 'archived';
  currentVersion: number;
  submittedVersion: number | null;
  /** The version production uses, if one is approved. */
  approvedVersion: number | null;
  /** Where the newest version stands in review. */
  reviewState: ReviewState;
  /**
   * The worst finding of the version that matters in a list: the approved version in the "for production" list,
   * the newest elsewhere. Only lists carry it.
   */
  safetyLevel?: 'ok' | 'caution' | 'danger';
  updatedAt: string;
}

/** One version of a recipe with its content (the newest unless another was asked for). */
export interface RecipeDetail extends Omit<RecipeSummary, 'reviewState'> {
  version: number;
  content: RecipeContent;
  versionNote: string;
  savedBy: string | null;
  savedAt: string;
  ingredientNames: Record<number, string>;
}

// Answers of the recipe, review, ingredient and calculation routes: the services declare these as their return
// types and the client hooks read them, so a change on either side is a type error on the other.

export interface ReviewTimeline {
  state: ReviewState;
  currentVersion: number;
  submittedVersion: number | null;
  approvedVersion: number | null;
  events: {
    id: number;
    version: number;
    action: string;
    by: string | null;
    comment: string;
    overrideReason: string | null;
    selfApproved: boolean;
    at: string;
  }[];
}

export interface VersionEntry {
  number: number;
  note: string;
  savedBy: string | null;
  savedAt: string;
}

export interface TastingEntry {
  id: number;
  /** The version tasted. */
  versionNumber: number;
  /** The version its sugar addition made, if any. */
  createdVersion: number | null;
  tastedOn: string;
  by: string | null;
  notes: string;
  scores: { sweetness: number; sourness: number; fizz: number; flavour: number };
  sugarAddition: TastingInput['sugarAddition'];
}

export interface IngredientPage {
  items: Ingredient[];
  total: number;
  page: number;
  pageSize: number;
}

export interface IngredientChangeEntry {
  id: number;
  action: string;
  at: string;
  by: string | null;
  changes: Record<string, [unknown, unknown]>;
}

export type BottleFormatRef = {
  id: number;
  name: string;
  maxWorkingPressureBar: number;
  pressureSource: string;
} | null;
export type CarbonationAnswer = CarbonationResult & { bottleFormat: BottleFormatRef };
export type PrimingAnswer = PrimingResult & { bottleFormat: BottleFormatRef };
export interface BrixAnswer {
  brix: number;
  specificGravity: number;
  sugarGPerL: number;
  caution: string;
}

// Batches: the floor's records. One model for the screen, the record PDF and the API.

export interface BatchSummary {
  id: number;
  lotCode: string;
  trial: boolean;
  state: import('@/lib/schemas/batches').BatchState;
  recipeId: number;
  recipeName: string;
  version: number;
  batch: { kind: import('@/lib/schemas/recipes').BatchKind; value: number };
  bottles: number;
  startedBy: string | null;
  startedAt: string;
}

export interface BatchReadingEntry {
  id: number;
  kind: import('@/lib/schemas/batches').ReadingKind;
  value: number;
  tempC: number | null;
  stage: import('@/lib/schemas/batches').Stage;
  source: 'in-house' | 'lab' | null;
  takenAt: string;
  note: string;
  check: { level: 'ok' | 'caution' | 'danger'; message: string; predictedGaugeBar?: number };
  correctsId: number | null;
  by: string | null;
  reports: Attachment[];
}

export interface BatchStepEntry {
  number: number;
  text: string;
  signedOff: { by: string | null; at: string; note: string } | null;
}

export interface BatchIngredientLotEntry {
  id: number;
  ingredientId: number | null;
  ingredientName: string;
  supplier: string;
  supplierLot: string;
  quantity: string;
  quantityValue: number;
  quantityUnit: 'g' | 'L';
  correctsId: number | null;
  by: string | null;
  at: string;
}

export interface BatchDeviationEntry {
  id: number;
  whatHappened: string;
  actionTaken: string;
  closesReadingId: number | null;
  correctsId: number | null;
  by: string | null;
  at: string;
}

export interface BatchDecisionEntry {
  id: number;
  decision: import('@/lib/schemas/batches').Decision;
  note: string;
  overrideReason: string | null;
  by: string | null;
  at: string;
}

export interface BatchDetail extends BatchSummary {
  card: import('@/lib/recipes/card').RecipeCard;
  facts: import('@/lib/batches/checks').BatchFacts;
  readings: BatchReadingEntry[];
  steps: BatchStepEntry[];
  ingredientLots: BatchIngredientLotEntry[];
  deviations: BatchDeviationEntry[];
  decisions: BatchDecisionEntry[];
  /** Danger readings nothing has answered yet: release needs an override reason while any stands. */
  standingDangers: number[];
}

export interface BatchPage {
  items: BatchSummary[];
  total: number;
  page: number;
  pageSize: number;
}

export interface TraceHit {
  batch: BatchSummary;
  lot: BatchIngredientLotEntry;
}
