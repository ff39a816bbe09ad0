"use client";

// The antenna plan form's inputs: the family and its own settings, the wire and the feedline
// type always; the band choice, ground, feedline length and transmitter only on the antenna
// bench (on a station slot those come from the slot and its site).
import type { UseFormReturn } from "react-hook-form";
import { CheckboxField, SelectField, TextField } from "@/components/ui/field";
import type { ItuRegion } from "@/lib/antenna/bands";
import { MODE_DUTY } from "@/lib/antenna/exposure";
import { FAMILIES } from "@/lib/antenna/families";
import { FEEDLINE_TYPES } from "@/lib/antenna/feedline-types";
import { GROUND_CLASSES } from "@/lib/antenna/ground-classes";
import type { PlanFormValues } from "@/lib/plan-screen/form-values";
import { METRES_PER_FOOT, type Units } from "@/lib/plan-screen/format";
import { planBandNames } from "@/validations/slot-form";

/** "" → undefined (the engine's default, or "must be a number"), anything else → a number. */
const asNumber = { setValueAs: (value: unknown) => (value === "" || value === undefined ? undefined : Number(value)) };

const familyOptions = FAMILIES.map((family) => ({ value: family.id, label: family.label }));
const feedlineOptions = FEEDLINE_TYPES.map((type) => ({ value: type.id, label: `${type.label} (${type.z0Ohms} Ω)` }));
const modeOptions = Object.values(MODE_DUTY).map((mode) => ({ value: mode.mode, label: mode.label }));
const groundOptions = [
  ...GROUND_CLASSES.map((ground) => ({ value: ground.id, label: ground.label })),
  { value: "free-space", label: "Free space (no ground, for comparison)" },
  { value: "perfect", label: "Perfect ground (for comparison)" },
  { value: "custom", label: "Custom conductivity and permittivity" },
];
const conductorOptions = [
  { value: "copper", label: "Copper" },
  { value: "aluminium", label: "Aluminium" },
  { value: "perfect", label: "Lossless (for comparison)" },
];

interface FieldsProps {
  form: UseFormReturn<PlanFormValues>;
  region: ItuRegion;
  units: Units;
  /** False on a station slot: band, ground, feedline length and transmitter come from the slot. */
  siteFields: boolean;
  /** A coax run booked as the slot's feedline (its words): it sets the line, so its type is not chosen here. */
  bookedFeedline?: string;
}

export function PlanFormFields({ form, region, units, siteFields, bookedFeedline }: FieldsProps) {
  const { register, watch, formState } = form;
  const family = watch("family");
  const height = watch("heightM");
  const info = FAMILIES.find((candidate) => candidate.id === family);
  const errors = formState.errors;
  const bandNames = planBandNames(region);
  const meaning = (name: string) => info?.parameters.find((parameter) => parameter.name === name)?.meaning;
  const feetHint = units === "imperial" && Number.isFinite(height) ? `≈ ${(height / METRES_PER_FOOT).toFixed(1)} ft` : undefined;

  return (
    <>
      <SelectField label="Antenna family" options={familyOptions} error={errors.family?.message} {...register("family")} />
      {siteFields && family !== "fan-dipole" && (
        <SelectField label="Band" options={bandNames.map((name) => ({ value: name, label: name }))} error={errors.band?.message} {...register("band")} />
      )}
      {siteFields && family === "fan-dipole" && (
        <fieldset className="mb-4">
          <legend className="font-bold text-slate-800">Bands (two or three)</legend>
          <div className="grid grid-cols-3 gap-x-3">
            {bandNames.map((name) => (
              <CheckboxField key={name} label={name} value={name} {...register("bands")} />
            ))}
          </div>
          {errors.bands && (
            <p className="text-sm font-bold text-danger-600" role="alert">
              {errors.bands.message ?? (errors.bands as unknown as { message?: string }[]).find((entry) => entry?.message)?.message}
            </p>
          )}
        </fieldset>
      )}
      <TextField
        label="Height (m)"
        type="number"
        inputMode="decimal"
        step="0.1"
        hint={[info?.heightMeaning, feetHint].filter(Boolean).join("; ")}
        error={errors.heightM?.message}
        {...register("heightM", asNumber)}
      />
      {family === "inverted-v" && (
        <TextField label="Included angle (°)" type="number" step="1" hint={meaning("includedAngleDeg")} error={errors.includedAngleDeg?.message} {...register("includedAngleDeg", asNumber)} />
      )}
      {family === "vertical" && (
        <>
          <TextField label="Radials" type="number" step="1" hint={meaning("radials")} error={errors.radials?.message} {...register("radials", asNumber)} />
          <TextField label="Radial droop (°)" type="number" step="1" hint={meaning("radialDroopDeg")} error={errors.radialDroopDeg?.message} {...register("radialDroopDeg", asNumber)} />
        </>
      )}
      {family === "end-fed" && (
        <>
          <SelectField
            label="Unun"
            options={[
              { value: "49:1", label: "49:1" },
              { value: "64:1", label: "64:1" },
            ]}
            error={errors.unun?.message}
            {...register("unun")}
          />
          <TextField label="Far-end height (m, optional)" type="number" step="0.1" hint={meaning("farEndHeightM")} error={errors.farEndHeightM?.message} {...register("farEndHeightM", asNumber)} />
          <TextField label="Counterpoise (m, optional)" type="number" step="0.1" hint={meaning("counterpoiseM")} error={errors.counterpoiseM?.message} {...register("counterpoiseM", asNumber)} />
        </>
      )}
      {family === "off-centre-fed" && (
        <TextField label="Feed position (fraction of the length)" type="number" step="0.01" hint={meaning("feedPosition")} error={errors.feedPosition?.message} {...register("feedPosition", asNumber)} />
      )}
      {family === "fan-dipole" && (
        <TextField label="Element spread (°)" type="number" step="1" hint={meaning("spreadDeg")} error={errors.spreadDeg?.message} {...register("spreadDeg", asNumber)} />
      )}
      <TextField label="Wire diameter (mm)" type="number" inputMode="decimal" step="0.1" error={errors.wireDiameterMm?.message} {...register("wireDiameterMm", asNumber)} />
      <SelectField label="Wire" options={conductorOptions} error={errors.conductor?.message} {...register("conductor")} />
      {bookedFeedline ? (
        <p className="mb-4 text-sm">
          <span className="font-bold">Feedline type:</span> that of the booked coax run, {bookedFeedline}.
        </p>
      ) : (
        <SelectField label="Feedline type" options={feedlineOptions} error={errors.feedline?.type?.message} {...register("feedline.type")} />
      )}
      {siteFields && (
        <>
          <TextField label="Feedline length (m)" type="number" step="0.5" error={errors.feedline?.lengthM?.message} {...register("feedline.lengthM", asNumber)} />
          <SelectField label="Ground" options={groundOptions} error={errors.ground?.message} {...register("ground")} />
          {watch("ground") === "custom" && (
            <>
              <TextField label="Ground conductivity (S/m)" type="number" step="0.001" error={errors.customGround?.conductivitySm?.message} {...register("customGround.conductivitySm", asNumber)} />
              <TextField label="Ground relative permittivity" type="number" step="1" error={errors.customGround?.relativePermittivity?.message} {...register("customGround.relativePermittivity", asNumber)} />
            </>
          )}
          <TextField label="Transmitter power (W, PEP)" type="number" step="1" error={errors.transmitter?.powerW?.message} {...register("transmitter.powerW", asNumber)} />
          <SelectField label="Mode" options={modeOptions} error={errors.transmitter?.mode?.message} {...register("transmitter.mode")} />
        </>
      )}
    </>
  );
}
