// The form schemas live in lib/forms/ (one per form); these names stay for the route handlers.
export { practiceFormSchema, type PracticeForm } from "@/lib/forms/practice";
export { sourceCheckSchema } from "@/lib/forms/source-check";
