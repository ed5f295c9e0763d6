import { Alert, List, Stack, Text } from '@mantine/core';
import { SEVERITY_LOOK } from '@/components/ui/severity-look';
import { findingsHeadline, type ObservationFinding } from '../utils/observation-warnings';

/** The text as a sentence: a full stop unless it ends with one. */
const sentence = (text: string) => (/[.!?]$/.test(text) ? text : `${text}.`);

function Tier({ severity, findings }: { severity: 'urgent' | 'review'; findings: readonly ObservationFinding[] }) {
  if (findings.length === 0) return null;
  const look = SEVERITY_LOOK[severity];
  return (
    <Alert
      color={look.color}
      variant={severity === 'urgent' ? 'filled' : 'light'}
      icon={<look.icon aria-hidden />}
      title={findingsHeadline(severity, findings.length)}
      data-findings={severity}
    >
      <List size="sm" spacing={4}>
        {findings.map((finding) => (
          <List.Item key={finding.code}>
            <Text span inherit fw={700}>
              {sentence(finding.message)}
            </Text>{' '}
            {sentence(finding.action)}
          </List.Item>
        ))}
      </List>
    </Alert>
  );
}

/**
 * Before saving: what the observation as typed will raise, urgent (filled red, octagon, "Urgent: act now")
 * apart from review (light orange, triangle, "Review"), so the two tiers never read alike.
 */
export function ObservationFindings({ findings }: { findings: readonly ObservationFinding[] }) {
  const urgent = findings.filter((finding) => finding.severity === 'urgent');
  const review = findings.filter((finding) => finding.severity === 'review');
  if (findings.length === 0) return null;
  return (
    <Stack gap="sm" aria-live="polite" aria-label="What saving raises">
      <Tier severity="urgent" findings={urgent} />
      <Tier severity="review" findings={review} />
    </Stack>
  );
}
