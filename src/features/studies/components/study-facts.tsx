import type { Fact } from '../document-facts';
import { formatDateTime } from '../format';
import type { StudySummary } from '../types';
import { FactGrid } from './fact-grid';

export type StudyFactsProps = { study: StudySummary };

/** Who owns the study and when it last changed. */
export function StudyFacts({ study }: StudyFactsProps) {
  const facts: Fact[] = [
    { label: 'Team', value: study.teamName },
    { label: 'Author', value: study.author.name },
    { label: 'Revision', value: `v${study.version}` },
    { label: 'Created', value: formatDateTime(study.createdAt) },
    { label: 'Updated', value: formatDateTime(study.updatedAt) },
  ];
  return <FactGrid facts={facts} />;
}
