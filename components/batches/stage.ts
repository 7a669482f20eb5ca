import type { BatchStepEntry } from '@/lib/api/types';
import type { Stage } from '@/lib/schemas/batches';

/**
 * The stage a reading most likely belongs to, from the next step not yet signed off (the card's step texts say what
 * they do: steep, strain, top up, bottle, chill). Everything signed: the finished batch.
 */
export function stageFromNextStep(steps: BatchStepEntry[]): Stage {
  const next = steps.find((s) => !s.signedOff);
  if (!next) return 'finished';
  const text = next.text.toLowerCase();
  if (next.number === 1) return 'base';
  if (/strain/.test(text)) return 'after-flavour';
  if (/top up|dissolve/.test(text)) return 'after-strain';
  if (/chill|cold/.test(text)) return 'conditioning';
  if (/bottle|cap|carbonate|condition/.test(text)) return 'after-flavour';
  return 'conditioning';
}
