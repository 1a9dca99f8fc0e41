/** Types of model.js: the form's fields and the model built from them. */
export interface FormField {
  readonly name: string;
  readonly label: string;
  readonly unit: string;
  readonly value: string;
}
export const FIELDS: readonly FormField[];
export function memberModel(values: Readonly<Record<string, string>>): unknown;
