/** The pane's tools in tab order. */
import { CERTIFICATE_TOOL } from '../certificate';
import { REFERENCE_TOOL } from '../reference';
import { SWEEP_TOOL } from '../sweep';
import type { PaneTool } from '../tool';

export const PANE_TOOLS: readonly PaneTool[] = [SWEEP_TOOL, CERTIFICATE_TOOL, REFERENCE_TOOL];
