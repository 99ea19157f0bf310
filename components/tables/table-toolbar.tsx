"use client";

import { Input } from "@/components/ui/input";
import { Select, type SelectOption } from "@/components/ui/select";

/** Search box, one choice filter and one on/off switch above a table. */
export function TableToolbar({
  search,
  onSearch,
  searchLabel,
  filter,
  toggle,
}: {
  search: string;
  onSearch: (v: string) => void;
  searchLabel: string;
  filter?: { label: string; value: string; onChange: (v: string) => void; options: SelectOption[] };
  toggle?: { label: string; checked: boolean; onChange: (v: boolean) => void };
}) {
  return (
    <div className="flex flex-wrap items-center gap-3">
      <div className="w-72">
        <Input type="search" value={search} onChange={(e) => onSearch(e.target.value)} placeholder={`${searchLabel}…`} aria-label={searchLabel} />
      </div>
      {filter ? (
        <div className="w-56">
          <Select value={filter.value} onValueChange={filter.onChange} options={filter.options} ariaLabel={filter.label} />
        </div>
      ) : null}
      {toggle ? (
        <label className="flex items-center gap-2 text-sm text-cocoa-700">
          <input type="checkbox" checked={toggle.checked} onChange={(e) => toggle.onChange(e.target.checked)} className="size-4 accent-pod" />
          {toggle.label}
        </label>
      ) : null}
    </div>
  );
}
