// The cautions every results view shows (architecture §3, same content as the CLI's caution),
// as separate short lines for the results panel.
export const RESULTS_CAUTIONS: readonly string[] = [
  'Model estimates for planning and comparing lighting options — not diagnosis or treatment.',
  'People differ widely; individual responses can be far from these predictions.',
  'Follow local codes, lighting standards and photobiological safety limits.',
  'Consult qualified clinicians before any therapeutic use of light.',
];
