import "server-only";
import type { Adapter, AdapterUser } from "next-auth/adapters";
import type { Db } from "@/db/client";
import type { User } from "@/db/schema";
import { createUser, deleteUser, getUserByEmail, getUserById, updateUser } from "@/db/queries/users";
import { consumeVerificationToken, createVerificationToken } from "@/db/queries/tokens";

function toAdapterUser(user: User): AdapterUser {
  return { id: user.id, email: user.email, name: user.name || null, emailVerified: user.emailVerified };
}

/**
 * The part of a next-auth adapter our sign-in needs: users and verification tokens for
 * e-mailed links. Sessions are JWTs and there are no OAuth accounts, so those methods are absent.
 */
export function drizzleAdapter(getDb: () => Promise<Db>): Adapter {
  return {
    async createUser(user: Omit<AdapterUser, "id">) {
      const db = await getDb();
      const name = user.name || user.email.split("@")[0];
      return toAdapterUser(await createUser({ db, email: user.email, name, emailVerified: user.emailVerified ?? null }));
    },
    async getUser(id) {
      const user = await getUserById({ db: await getDb(), id });
      return user ? toAdapterUser(user) : null;
    },
    async getUserByEmail(email) {
      const user = await getUserByEmail({ db: await getDb(), email });
      return user ? toAdapterUser(user) : null;
    },
    async getUserByAccount() {
      return null;
    },
    async updateUser(user) {
      const db = await getDb();
      const changes: Parameters<typeof updateUser>[0]["changes"] = {};
      if (user.name !== undefined) changes.name = user.name ?? "";
      if (user.email !== undefined) changes.email = user.email;
      if (user.emailVerified !== undefined) changes.emailVerified = user.emailVerified;
      const updated = await updateUser({ db, id: user.id, changes });
      if (!updated) throw new Error(`updateUser: no user ${user.id}`);
      return toAdapterUser(updated);
    },
    async deleteUser(id) {
      await deleteUser({ db: await getDb(), id });
    },
    async createVerificationToken(token) {
      return createVerificationToken({ db: await getDb(), ...token });
    },
    async useVerificationToken({ identifier, token }) {
      return consumeVerificationToken({ db: await getDb(), identifier, token });
    },
  };
}
