import { complexities, complexityLabels } from '@kerfmark/dieline';

/** The complexity classes as a filter's choices. */
export const complexityOptions = complexities.map((value) => ({ value, label: complexityLabels[value] }));
