"use client";

import { useActionState, useState, useTransition } from "react";
import { archiveMachineAction, archiveStationAction, createMachineAction, createStationAction } from "@/app/(app)/settings/machines/actions";
import { FormAlert, fieldError } from "@/components/forms/form-alert";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Input } from "@/components/ui/input";
import { NumberField } from "@/components/ui/number-field";
import { Select } from "@/components/ui/select";

export function MachineForm() {
  const [result, action, pending] = useActionState(createMachineAction, null);
  const err = (f: string) => fieldError(result, f);
  return (
    <form action={action} className="grid gap-4 sm:grid-cols-4 sm:items-end" noValidate aria-label="Add a machine">
      <div className="sm:col-span-4">
        <FormAlert result={result?.ok ? { ok: true, message: "Machine added." } : result} />
      </div>
      <Field id="machineName" label="Name" error={err("name")}>
        <Input id="machineName" name="name" placeholder="Stone refiner 3" />
      </Field>
      <Field id="machineKind" label="Kind" error={err("kind")}>
        <Select id="machineKind" name="kind" ariaLabel="Kind" defaultValue="refiner"
          options={[{ value: "refiner", label: "Refiner (melanger)" }, { value: "conche", label: "Conche" }, { value: "tempering", label: "Tempering machine" }]} />
      </Field>
      <Field id="machineCapacityKg" label="Capacity" error={err("capacityKg")}>
        <NumberField id="machineCapacityKg" name="capacityKg" unit="kg" />
      </Field>
      <Button type="submit" disabled={pending}>
        Add machine
      </Button>
    </form>
  );
}

export function StationForm() {
  const [result, action, pending] = useActionState(createStationAction, null);
  const err = (f: string) => fieldError(result, f);
  return (
    <form action={action} className="grid gap-4 sm:grid-cols-4 sm:items-end" noValidate aria-label="Add a weighing station">
      <div className="sm:col-span-4">
        <FormAlert result={result?.ok ? { ok: true, message: "Weighing station added." } : result} />
      </div>
      <Field id="stationName" label="Name" error={err("name")}>
        <Input id="stationName" name="name" placeholder="Bench scale" />
      </Field>
      <Field id="resolutionGrams" label="Resolution (step)" error={err("resolutionGrams")}>
        <NumberField id="resolutionGrams" name="resolutionGrams" unit="g" />
      </Field>
      <Field id="stationCapacityKg" label="Capacity (optional)" error={err("capacityKg")}>
        <NumberField id="stationCapacityKg" name="capacityKg" unit="kg" />
      </Field>
      <Button type="submit" disabled={pending}>
        Add station
      </Button>
    </form>
  );
}

/** Retires a machine or station; batches already planned keep what they were planned with. */
export function RetireButton({ kind, id, name }: { kind: "machine" | "station"; id: string; name: string }) {
  const [error, setError] = useState<string | null>(null);
  const [pending, start] = useTransition();
  return (
    <>
      <Button
        size="sm"
        variant="quiet"
        disabled={pending}
        aria-label={`Retire ${name}`}
        onClick={() =>
          start(async () => {
            const r = kind === "machine" ? await archiveMachineAction({ machineId: id }) : await archiveStationAction({ stationId: id });
            if (!r.ok) setError(r.message);
          })
        }
      >
        Retire
      </Button>
      {error ? <span role="alert" className="text-sm text-brick">{error}</span> : null}
    </>
  );
}
