import type { DraftCheck } from './check-draft';
import type { Draft } from './draft';

/** What every section of the geometry editor receives: the draft, a way to change it, and its check. */
export interface SectionProps {
  draft: Draft;
  update: (change: (draft: Draft) => Draft) => void;
  check: DraftCheck;
}
