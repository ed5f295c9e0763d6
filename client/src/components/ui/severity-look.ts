import type { ComponentType } from 'react';
import { IconAlertOctagon, IconAlertTriangle, IconCircleDashed, IconInfoCircle, type IconProps } from '@tabler/icons-react';
import { FLAG_SEVERITY_LABELS, type FlagSeverity } from '@lockstep/shared';

/** A flag's severity, or 'routine' for what has nothing to raise (a handover row without flags). */
export type Severity = FlagSeverity | 'routine';

export interface SeverityLook {
  label: string;
  /** For a badge or an alert, which pick their own shade. */
  color: string;
  /** For words on the page: a shade dark enough to read as text. */
  textColor: string;
  icon: ComponentType<IconProps>;
}

// Severity is always icon + word + colour (docs/design.md, "Screens and wording"): the shapes differ as well as
// the colours, so a black-and-white print or a colour-blind reader loses nothing.
export const SEVERITY_LOOK: Record<Severity, SeverityLook> = {
  urgent: { label: FLAG_SEVERITY_LABELS.urgent, color: 'red', textColor: 'red.8', icon: IconAlertOctagon },
  review: { label: FLAG_SEVERITY_LABELS.review, color: 'orange', textColor: 'orange.9', icon: IconAlertTriangle },
  info: { label: FLAG_SEVERITY_LABELS.info, color: 'blue', textColor: 'blue.8', icon: IconInfoCircle },
  routine: { label: 'Routine', color: 'slate', textColor: 'slate.7', icon: IconCircleDashed },
};
