// The proposed detachment drawn back onto the section, with its 95% band (interpretation pane).
import { Layer } from 'react-konva';

export function DetachmentLayer() {
  return <Layer listening={false} />;
}
