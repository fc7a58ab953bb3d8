// The caution of METHOD.md, always visible with the results (RULES.md).
import { SECTION_CAUTION } from '../../core/analysis/caution';

export function Cautions() {
  return (
    <p className="caution" data-testid="pane-caution">
      <b>Caution.</b> {SECTION_CAUTION}
    </p>
  );
}
