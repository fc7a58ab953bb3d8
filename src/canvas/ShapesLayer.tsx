// Digitised horizons, regionals, pins and excess-area fills (section workspace).
import { Layer } from 'react-konva';

export function ShapesLayer() {
  return <Layer />;
}
