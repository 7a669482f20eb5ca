import type { QueryInterface } from 'sequelize';

import * as accounts from './0001-accounts';
import * as calculations from './0002-calculations';
import * as ingredients from './0003-ingredients';
import * as attachments from './0004-attachments';
import * as recipes from './0005-recipes';
import * as reviews from './0006-reviews';
import * as secureDefaults from './0007-secure-defaults';
import * as warmDay from './0008-warm-day';
import * as alcoholLicence from './0009-alcohol-licence';
import * as tastingVersions from './0010-tasting-versions';
import * as ratingShare from './0011-rating-share';
import * as dropRecipeStatus from './0012-drop-recipe-status';
import * as batches from './0013-batches';
import * as displayNames from './0014-display-names-and-currency';
import * as nutrition from './0015-nutrition';
import * as jsonb from './0016-jsonb';
import * as rateLimitHits from './0017-rate-limit-hits';

type Step = (params: { context: QueryInterface }) => Promise<void>;

/**
 * Every migration, in order. Listed by hand rather than found by glob so that the same list works under
 * tsx, Jest and any bundler. Add a new file and append it here; never edit a migration that has shipped.
 */
export const migrations: { name: string; up: Step; down: Step }[] = [
  { name: '0001-accounts', ...accounts },
  { name: '0002-calculations', ...calculations },
  { name: '0003-ingredients', ...ingredients },
  { name: '0004-attachments', ...attachments },
  { name: '0005-recipes', ...recipes },
  { name: '0006-reviews', ...reviews },
  { name: '0007-secure-defaults', ...secureDefaults },
  { name: '0008-warm-day', ...warmDay },
  { name: '0009-alcohol-licence', ...alcoholLicence },
  { name: '0010-tasting-versions', ...tastingVersions },
  { name: '0011-rating-share', ...ratingShare },
  { name: '0012-drop-recipe-status', ...dropRecipeStatus },
  { name: '0013-batches', ...batches },
  { name: '0014-display-names-and-currency', ...displayNames },
  { name: '0015-nutrition', ...nutrition },
  { name: '0016-jsonb', ...jsonb },
  { name: '0017-rate-limit-hits', ...rateLimitHits },
];
