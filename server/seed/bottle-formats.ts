import type { BottleFormatInput } from '@/lib/schemas/bottle-formats';

// Typical ratings from memory, as the note says: the supplier's sheet replaces them.
const TYPICAL = 'Typical value for this kind of bottle: confirm with your supplier';

/**
 * The starter formats every new brewery gets. Volumes are the usual nominal fills; headspace is a typical fill
 * height; pressures are typical working ratings, not any supplier's figure, and say so. Owners edit them.
 */
export const STARTER_BOTTLE_FORMATS: BottleFormatInput[] = [
  {
    name: 'Glass crown cap 330 mL',
    liquidMl: 330,
    headspaceMl: 20,
    closure: 'crown-cap',
    material: 'glass',
    maxWorkingPressureBar: 3,
    pressureSource: TYPICAL,
    notes: null,
  },
  {
    name: 'Glass crown cap 355 mL',
    liquidMl: 355,
    headspaceMl: 20,
    closure: 'crown-cap',
    material: 'glass',
    maxWorkingPressureBar: 3,
    pressureSource: TYPICAL,
    notes: null,
  },
  {
    name: 'Glass crown cap 473 mL',
    liquidMl: 473,
    headspaceMl: 25,
    closure: 'crown-cap',
    material: 'glass',
    maxWorkingPressureBar: 3,
    pressureSource: TYPICAL,
    notes: '16 US fl oz',
  },
  {
    name: 'Glass crown cap 500 mL',
    liquidMl: 500,
    headspaceMl: 25,
    closure: 'crown-cap',
    material: 'glass',
    maxWorkingPressureBar: 3,
    pressureSource: TYPICAL,
    notes: null,
  },
  {
    name: 'Swing top glass 500 mL',
    liquidMl: 500,
    headspaceMl: 30,
    closure: 'swing-top',
    material: 'glass',
    maxWorkingPressureBar: 3,
    pressureSource: TYPICAL,
    notes: 'Check the seal ring before each use.',
  },
  {
    name: 'Swing top glass 1 L',
    liquidMl: 1000,
    headspaceMl: 40,
    closure: 'swing-top',
    material: 'glass',
    maxWorkingPressureBar: 3,
    pressureSource: TYPICAL,
    notes: 'Check the seal ring before each use.',
  },
  {
    name: 'Heavy sparkling-wine glass 750 mL',
    liquidMl: 750,
    headspaceMl: 25,
    closure: 'cork-and-cage',
    material: 'glass',
    maxWorkingPressureBar: 6,
    pressureSource: TYPICAL,
    notes: 'Heavy bottles made for sparkling wine.',
  },
  {
    name: 'PET 500 mL',
    liquidMl: 500,
    headspaceMl: 25,
    closure: 'screw-cap',
    material: 'pet',
    maxWorkingPressureBar: 5,
    pressureSource: TYPICAL,
    notes: 'PET made for carbonated soft drinks; it softens when hot.',
  },
];
