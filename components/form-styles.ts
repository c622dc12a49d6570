// The look of a form field inside a label, shared by the forms that lay out their own labels.
export const FIELD_INPUT = "mt-1 block min-h-11 w-full rounded-lg border border-ink/30 bg-paper-raised px-2";
