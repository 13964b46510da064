/** The caution shown wherever results are shown (CLI, UI, report). */
export const SCREENING_CAUTION =
  'Screening estimate only. Local codes, the permitting authority and licensed engineering practice govern; ' +
  'verify with site data before relying on a result for a permit, an intake or public health.';
