/**
 * Observable Plot (with d3) is loaded only when a chart mounts: this dynamic import
 * becomes its own chunk, so the main bundle never carries it. Tests mock this module.
 */
export type PlotModule = typeof import('@observablehq/plot');

let loading: Promise<PlotModule> | null = null;

export function loadPlot(): Promise<PlotModule> {
  loading ??= import('@observablehq/plot').catch((error: unknown) => {
    loading = null;
    throw error;
  });
  return loading;
}
