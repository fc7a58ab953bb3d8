// Project save/open, imports and exports (files and reports).
export function FileMenu() {
  return null;
}
