import firstTry from '../../../templates/first-try-too-sparse.json';
import metric from '../../../templates/metric-tin-stove.json';
import no10 from '../../../templates/no10-can-stove.json';
import pint from '../../../templates/pint-can-stove.json';
import seam from '../../../templates/seam-keepout-concentrator.json';
import type { DesignInput } from '../../../shared/design/design-schema.ts';

/** The example designs a visitor can start from (the invented Alder Street Makerspace's stoves). */
export const examples: { id: string; document: DesignInput }[] = [
  { id: 'pint-can-stove', document: pint as DesignInput },
  { id: 'no10-can-stove', document: no10 as DesignInput },
  { id: 'metric-tin-stove', document: metric as DesignInput },
  { id: 'seam-keepout-concentrator', document: seam as DesignInput },
  { id: 'first-try-too-sparse', document: firstTry as DesignInput },
];
