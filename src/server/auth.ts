// next-auth configuration: e-mail and password, JWT sessions that carry only the user's id.
// The role and the mentor flag are read from the database on every request (session.ts),
// so a change on the members page takes effect at once.
import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { PublicError } from "@/server/errors";
import { verifyCredentials } from "@/server/services/accounts";
import { signInSchema } from "@/validations/accounts";

/** The client address behind the load balancer: the first hop it recorded. */
export function clientAddressFrom(headers: Record<string, unknown> | Headers | undefined): string {
  const read = (name: string): string | undefined => {
    if (!headers) return undefined;
    if (headers instanceof Headers) return headers.get(name) ?? undefined;
    const value = headers[name];
    return typeof value === "string" ? value : undefined;
  };
  return read("x-forwarded-for")?.split(",")[0]?.trim() || read("x-real-ip") || "unknown";
}

/** Sign-in errors travel to the browser as "field|message" in next-auth's error string. */
export const signInErrorSeparator = "|";

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: 30 * 24 * 3600 },
  pages: { signIn: "/sign-in" },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, request) {
        const parsed = signInSchema.safeParse(credentials ?? {});
        if (!parsed.success) {
          const issue = parsed.error.issues[0];
          throw new Error(`${String(issue.path[0] ?? "email")}${signInErrorSeparator}${issue.message}`);
        }
        try {
          const user = await verifyCredentials({ ...parsed.data, clientAddress: clientAddressFrom(request?.headers) });
          return { id: user.id, name: user.name, email: user.email };
        } catch (error) {
          if (error instanceof PublicError) throw new Error(`${error.field ?? "form"}${signInErrorSeparator}${error.message}`);
          throw error;
        }
      },
    }),
  ],
  callbacks: {
    jwt({ token, user }) {
      if (user) token.uid = user.id;
      return token;
    },
    session({ session, token }) {
      if (session.user && typeof token.uid === "string") session.user.id = token.uid;
      return session;
    },
  },
};
