/** Types of scenario.js, the browser proof's shared workload (plain JS so the page loads it unbundled). */
export interface ScenarioResults {
  readonly reactions: number[];
  readonly momentMax: number;
  readonly momentMaxAt: number;
  readonly deflectionMin: number;
  readonly momentAt3: number;
  readonly sectionArea: number;
  readonly sectionSecondMomentZ: number;
  readonly rectangleSecondMomentZ: number;
  readonly analysis: unknown;
  readonly reportLength: number;
  readonly reportHasCaution: boolean;
  readonly diagramNames: string[];
  readonly svgs: string[];
}
/** The package's modules as loaded by the caller. */
export interface ScenarioLibrary {
  readonly flexura: Record<string, unknown>;
  readonly model: Record<string, unknown>;
  readonly report: Record<string, unknown>;
  readonly section: Record<string, unknown>;
}
export function runScenario(lib: ScenarioLibrary): ScenarioResults;
