import "server-only";
import { UniqueConstraintError } from "sequelize";
import { AppError } from "@/lib/shared/errors";
import { AuditEvent, User } from "@/models";
import { hashPassword, passwordSchema } from "@/lib/server/auth/password";
import { signUpFields } from "./pure/schemas";

/** Rider self sign-up. Refuses short or common passwords and taken addresses; writes nothing on refusal. */
export async function signUpRider(input: unknown) {
  const fields = signUpFields.parse(input);
  const password = passwordSchema.safeParse(fields.password);
  if (!password.success) throw new AppError(400, password.error.issues[0].message, "password");
  try {
    const user = await User.create({
      email: fields.email,
      name: fields.name,
      passwordHash: await hashPassword(password.data),
      siteRole: "rider",
      disabledAt: null,
    });
    await AuditEvent.create({ parkId: null, actorId: user.id, action: "account.sign-up", subjectType: "user", subjectId: user.id });
    return { id: user.id, email: user.email, name: user.name };
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw new AppError(409, "An account with that e-mail already exists.", "email");
    throw error;
  }
}
