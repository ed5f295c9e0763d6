import { describe, expect, it } from 'vitest';
import { BASAL_OPIOID_NAIVE_CAUTION, CROSS_TOLERANCE_CAUTION, DECISION_SUPPORT_CAUTION } from './cautions.js';

describe('caution texts', () => {
  it('carries the decision-support wording of docs/design.md', () => {
    expect(DECISION_SUPPORT_CAUTION).toBe(
      "Decision support only: check every value against the prescriber's order, local policy and licensed clinical judgement.",
    );
  });

  it('states the 25–50 % cross-tolerance reduction', () => {
    // Fine & Portenoy, J Pain Symptom Manage 2009;38(3):418-425.
    expect(CROSS_TOLERANCE_CAUTION).toContain('25–50 %');
  });

  it('advises against a routine basal infusion in opioid-naive adults, naming the guideline', () => {
    // Chou R et al., Management of Postoperative Pain, APS/ASRA/ASA guideline, J Pain 2016;17(2):131-157.
    // Written wrong before: it cited ASHP Standardize 4 Safety, which is not a source for this rule.
    expect(BASAL_OPIOID_NAIVE_CAUTION).toMatch(/not recommended in opioid-naive adults \(APS\/ASRA\/ASA guideline, 2016\)/);
  });

  it('uses safe symbols: no µg, no cc', () => {
    // ISMP List of Error-Prone Abbreviations, Symbols, and Dose Designations.
    for (const text of [DECISION_SUPPORT_CAUTION, CROSS_TOLERANCE_CAUTION, BASAL_OPIOID_NAIVE_CAUTION]) {
      expect(text).not.toMatch(/µg|μg|\bcc\b/);
    }
  });
});
