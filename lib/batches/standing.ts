/** The parts of the record that decide whether a danger reading still stands. */
interface Reading {
  id: number;
  kind: string;
  stage: string;
  level: 'ok' | 'caution' | 'danger';
  correctsId: number | null;
}

/**
 * Danger readings nothing has answered: not corrected by a later entry, not followed by an ok reading of the same
 * kind at the same stage, not closed by a deviation. Readings are in the order they were recorded (ids ascending).
 */
export function standingDangers(readings: Reading[], closedByDeviation: (number | null)[]): number[] {
  const corrected = new Set(readings.map((r) => r.correctsId).filter((id): id is number => id !== null));
  const closed = new Set(closedByDeviation.filter((id): id is number => id !== null));
  const ordered = [...readings].sort((a, b) => a.id - b.id);
  return ordered
    .filter((r) => r.level === 'danger' && !corrected.has(r.id) && !closed.has(r.id))
    .filter(
      (r) =>
        !ordered.some(
          (later) =>
            later.id > r.id &&
            later.kind === r.kind &&
            later.stage === r.stage &&
            later.level === 'ok' &&
            !corrected.has(later.id),
        ),
    )
    .map((r) => r.id);
}
