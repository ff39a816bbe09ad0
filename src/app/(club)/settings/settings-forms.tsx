"use client";

import { useActionForm } from "@/components/forms/use-action-form";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { passwordMinLength } from "@/lib/password-rules";
import { changePasswordSchema, clubSettingsSchema, profileSchema } from "@/validations/accounts";
import { changePasswordAction, updateClubSettingsAction, updateProfileAction } from "./actions";

const unitOptions = [
  { value: "metric", label: "Metric (metres)" },
  { value: "imperial", label: "Imperial (feet and inches)" },
];

function FormMessage({ message }: { message: { ok: boolean; text: string } | null }) {
  return message ? <Notice tone={message.ok ? "success" : "danger"}>{message.text}</Notice> : null;
}

export function ProfileForm({ defaults }: { defaults: { name: string; callSign: string; units: "metric" | "imperial" } }) {
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(profileSchema, updateProfileAction, { defaultValues: defaults });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Your details">
      <FormMessage message={formMessage} />
      <TextField label="Name" autoComplete="name" error={errorOf("name")} {...form.register("name")} />
      <TextField label="Call sign (optional)" error={errorOf("callSign")} {...form.register("callSign")} />
      <SelectField label="Units" options={unitOptions} error={errorOf("units")} {...form.register("units")} />
      <Button type="submit" disabled={submitting}>
        Save my details
      </Button>
    </form>
  );
}

export function PasswordForm() {
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(changePasswordSchema, changePasswordAction, {
    onSuccess: () => form.reset({ currentPassword: "", newPassword: "" }),
  });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Password">
      <FormMessage message={formMessage} />
      <TextField label="Current password" type="password" autoComplete="current-password" error={errorOf("currentPassword")} {...form.register("currentPassword")} />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${passwordMinLength} characters.`}
        error={errorOf("newPassword")}
        {...form.register("newPassword")}
      />
      <Button type="submit" disabled={submitting}>
        Change password
      </Button>
    </form>
  );
}

export function ClubSettingsForm({ defaults, timeZones }: { defaults: { clubName: string; ituRegion: number; timeZone: string; defaultUnits: "metric" | "imperial"; joinCode: string }; timeZones: string[] }) {
  const { form, onSubmit, errorOf, formMessage, submitting } = useActionForm(clubSettingsSchema, updateClubSettingsAction, { defaultValues: defaults });
  return (
    <form onSubmit={onSubmit} noValidate aria-label="Club settings">
      <FormMessage message={formMessage} />
      <TextField label="Club name" error={errorOf("clubName")} {...form.register("clubName")} />
      <SelectField
        label="ITU Region"
        hint="Sets the amateur band edges the antenna plans use."
        options={[
          { value: "1", label: "Region 1 (Europe, Africa, Middle East, northern Asia)" },
          { value: "2", label: "Region 2 (the Americas)" },
          { value: "3", label: "Region 3 (southern Asia, Oceania)" },
        ]}
        error={errorOf("ituRegion")}
        {...form.register("ituRegion")}
      />
      <SelectField label="Time zone" options={timeZones.map((zone) => ({ value: zone, label: zone }))} error={errorOf("timeZone")} {...form.register("timeZone")} />
      <SelectField label="Default units for new members" options={unitOptions} error={errorOf("defaultUnits")} {...form.register("defaultUnits")} />
      <TextField label="Join code" hint="Anyone with this code can join as a newcomer. Change it to stop old copies working." error={errorOf("joinCode")} {...form.register("joinCode")} />
      <Button type="submit" disabled={submitting}>
        Save club settings
      </Button>
    </form>
  );
}
