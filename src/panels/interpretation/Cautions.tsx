// The caution of docs/method.md §Cautions, always visible with the results (DEVELOPERS.md §Project rules).
import { SECTION_CAUTION } from '../../core/analysis/caution';

export function Cautions() {
  return (
    <p className="caution" data-testid="pane-caution">
      <b>Caution.</b> {SECTION_CAUTION}
    </p>
  );
}
