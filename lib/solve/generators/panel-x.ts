/** Span and panel count every layout starts from. */
export type PanelGrid = { span: number; panels: number };

/** x of panel point `i`: the span divided into equal panels. */
export function panelX(grid: PanelGrid, i: number): number {
  return (grid.span * i) / grid.panels;
}
