/** The chocolate types as choices (the words are the trade's). */
export const CHOCOLATE_TYPE_OPTIONS = [
  { value: "dark", label: "Dark" },
  { value: "milk", label: "Milk" },
  { value: "white", label: "White" },
  { value: "other", label: "Other" },
];
