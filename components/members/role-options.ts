import type { SelectOption } from "@/components/ui/select";

export const roleOptions: SelectOption[] = [
  { value: "owner", label: "owner — everything, including people" },
  { value: "formulator", label: "formulator — recipes and ingredients" },
  { value: "buyer", label: "buyer — suppliers, prices, costs" },
  { value: "production", label: "production — batches from released recipes" },
  { value: "viewer", label: "viewer — read only" },
];
