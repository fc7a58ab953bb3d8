// Handles, previews and the cursor readout drawn above the shapes (section workspace).
import { Layer } from 'react-konva';

export function OverlayLayer() {
  return <Layer />;
}
