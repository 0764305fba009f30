/**
 * The Certificate check tool: reads a supplier's wafer certificate table,
 * guesses what each column means, and adds columns of live DRIFT formulas
 * (doping at ρmin/ρmax, window check, sheet resistance, radial variation,
 * pass/fail with highlighting) to its right.
 */
import type { PaneTool } from '../tool';
import { mountCertificateCheck } from './view';

export const CERTIFICATE_TOOL: PaneTool = {
  id: 'certificate',
  label: 'Certificate check',
  mount: mountCertificateCheck,
};
