import type { Assessment } from '../site/assess';
import { slug } from './format';

/**
 * Document control of the calc package: a document number tied to the site file, the revision table,
 * the prepared / checked / approved boxes and the issue date (the date the document is issued, apart
 * from the date of the site data). Pure: the issue date is given by the caller, never read from a clock.
 */

export interface RevisionRow {
  revision: string;
  date: string;
  description: string;
  prepared: string;
  checked: string;
  approved: string;
}

export interface SignatureBox {
  role: 'Prepared' | 'Checked' | 'Approved';
  name: string;
  /** date beside the signature: the issue date when the name is known, else blank for a wet signature */
  date: string;
}

export interface DocumentControl {
  /** e.g. "GP-AMSEL-ESTUARY-80BEEA1E": the site's name and the first 8 hex digits of the site file's SHA-256 */
  number: string;
  revision: string;
  /** date of issue of this revision ("" when not issued: a draft) */
  issueDate: string;
  /** date of the site data, as the site file states it */
  siteDate: string;
  status: string;
  revisions: RevisionRow[];
  signatures: SignatureBox[];
  siteHash: string;
}

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** Whether a text is a calendar date YYYY-MM-DD that exists (Gregorian calendar). */
export function isIssueDate(text: string): boolean {
  if (!ISO_DATE.test(text)) return false;
  const [y, m, d] = text.split('-').map(Number);
  const leap = (y % 4 === 0 && y % 100 !== 0) || y % 400 === 0;
  const days = [31, leap ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
  return m >= 1 && m <= 12 && d >= 1 && d <= days[m - 1];
}

/** The document number: stable for one site file, different for any other. */
export function documentNumber(site: string, siteHash: string): string {
  return `GP-${slug(site, 24).toUpperCase()}-${siteHash.slice(0, 8).toUpperCase()}`;
}

export function documentControl(a: Assessment, issueDate = ''): DocumentControl {
  const p = a.project;
  const revision = p.revision || 'A';
  const issued = isIssueDate(issueDate) ? issueDate : '';
  return {
    number: documentNumber(p.site, a.siteHash),
    revision,
    issueDate: issued,
    siteDate: p.date,
    status: issued ? `Issued ${issued}` : 'Draft for checking (no issue date given)',
    revisions: [
      {
        revision,
        date: issued || '—',
        description: issued ? 'Issued for review' : 'Draft for checking',
        prepared: p.preparedBy || '—',
        checked: p.checkedBy || '—',
        approved: '—',
      },
    ],
    signatures: [
      { role: 'Prepared', name: p.preparedBy, date: p.preparedBy ? issued : '' },
      { role: 'Checked', name: p.checkedBy, date: p.checkedBy ? issued : '' },
      { role: 'Approved', name: '', date: '' },
    ],
    siteHash: a.siteHash,
  };
}
