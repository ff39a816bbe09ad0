import { z } from "zod";
import { passwordProblem } from "@/lib/password-rules";
import { roles } from "@/lib/roles";

export const emailField = z
  .string()
  .trim()
  .toLowerCase()
  .min(1, "Enter your e-mail address.")
  .max(254, "That e-mail address is too long.")
  .pipe(z.email("Enter a valid e-mail address, like name@example.org."));

export const passwordField = z.string().superRefine((value, context) => {
  const problem = passwordProblem(value);
  if (problem) context.addIssue({ code: "custom", message: problem });
});

export const nameField = z.string().trim().min(1, "Enter a name.").max(80, "Use at most 80 characters.");

/** Amateur call signs: letters and digits with at least one digit, an optional /suffix. */
export const callSignField = z
  .string()
  .trim()
  .toUpperCase()
  .max(16, "Use at most 16 characters.")
  .refine((value) => value === "" || /^(?=.*[0-9])(?=.*[A-Z])[A-Z0-9]{3,10}(\/[A-Z0-9]{1,4})?$/.test(value), {
    message: "A call sign has letters and at least one digit, like Q9ABC or Q9ABC/P.",
  })
  .transform((value) => (value === "" ? null : value));

export const signInSchema = z.object({
  email: emailField,
  password: z.string().min(1, "Enter your password."),
});

export const joinSchema = z.object({
  joinCode: z.string().trim().min(1, "Enter the club's join code."),
  name: nameField,
  email: emailField,
  callSign: callSignField.optional().default(""),
  password: passwordField,
});

export const inviteSchema = z.object({
  name: nameField,
  email: emailField,
  role: z.enum(roles, { message: "Choose a role." }),
  isMentor: z.coerce.boolean().default(false),
});

export const acceptInvitationSchema = z.object({
  token: z.string().min(20, "This invitation link is incomplete."),
  callSign: callSignField.optional().default(""),
  password: passwordField,
});

export const profileSchema = z.object({
  name: nameField,
  callSign: callSignField.optional().default(""),
  units: z.enum(["metric", "imperial"], { message: "Choose metric or imperial." }),
});

export const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, "Enter your current password."),
    newPassword: passwordField,
  })
  .refine((value) => value.currentPassword !== value.newPassword, {
    path: ["newPassword"],
    message: "Choose a password different from the current one.",
  });

export const memberChangeSchema = z.object({
  userId: z.uuid("Unknown member."),
  role: z.enum(roles, { message: "Choose a role." }).optional(),
  isMentor: z.boolean().optional(),
  confirm: z.boolean().optional(),
});

export const clubSettingsSchema = z.object({
  clubName: nameField,
  ituRegion: z.coerce.number().int().min(1, "Choose ITU Region 1, 2 or 3.").max(3, "Choose ITU Region 1, 2 or 3."),
  timeZone: z
    .string()
    .trim()
    .refine((zone) => Intl.supportedValuesOf("timeZone").includes(zone) || zone === "UTC", {
      message: "Choose an IANA time zone, like Europe/Lisbon.",
    }),
  defaultUnits: z.enum(["metric", "imperial"], { message: "Choose metric or imperial." }),
  joinCode: z.string().trim().min(6, "Use at least 6 characters.").max(40, "Use at most 40 characters."),
});
