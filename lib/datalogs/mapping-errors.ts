// The column mapping's problems by the field they concern, for the form to show beside each one.
import { datalogMappingSchema, type DatalogMappingInput } from "./parse";

export type MappingErrors = Partial<Record<keyof DatalogMappingInput, string[]>>;

/** Every problem of the mapping, keyed by its field ("time": ["Column 1 is already used for engine speed; …"]). */
export function mappingFieldErrors(mapping: DatalogMappingInput): MappingErrors {
  const r = datalogMappingSchema.safeParse(mapping);
  if (r.success) return {};
  const out: MappingErrors = {};
  for (const issue of r.error.issues) {
    const key = (issue.path[0] ?? "delimiter") as keyof DatalogMappingInput;
    (out[key] ??= []).push(issue.message);
  }
  return out;
}
