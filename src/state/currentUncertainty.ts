// The uncertainty report of a scenario from the session's last Monte Carlo run (uncertaintyStore).
import { activeScenario } from '../core/model/docToSection';
import type { ProjectDoc } from '../core/model/projectDoc';
import { uncertaintyReport, type UncertaintyReport } from '../io/uncertaintyReport';
import { selectAnalysis } from './selectors';
import { useUncertaintyStore } from './uncertaintyStore';

/** Returns the uncertainty report of the scenario (default the active one) as the session holds it now. */
export function currentUncertainty(doc: ProjectDoc, scenarioId = activeScenario(doc).id): UncertaintyReport {
  const analysis = selectAnalysis(doc, scenarioId);
  const record = useUncertaintyStore.getState().byScenario[scenarioId] ?? null;
  const section = analysis.docSection.ok ? analysis.docSection.section : null;
  const result = analysis.outcome && analysis.outcome.ok ? analysis.outcome.analysis : null;
  return uncertaintyReport(record, section, result);
}
