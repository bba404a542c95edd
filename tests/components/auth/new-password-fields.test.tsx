import { describe, expect, it } from "vitest";
import { renderToStaticMarkup } from "react-dom/server";
import { z } from "zod";
import { newPasswordTwice, repeatMustMatch } from "@/components/auth/fields";
import { ChoosePasswordForm } from "@/components/auth/password-reset-forms";
import { SignUpForm } from "@/components/auth/sign-up-form";

const labels = (html: string) => [...html.matchAll(/<label[^>]*>([^<]*)<\/label>/g)].map((m) => m[1]);

describe("the new password and its repeat", () => {
  it("keep each form's own labels (the e2e specs find the fields by them)", () => {
    expect(labels(renderToStaticMarkup(<SignUpForm />))).toEqual(["Name", "E-mail", "Password", "Repeat the password"]);
    expect(labels(renderToStaticMarkup(<ChoosePasswordForm token="t" email={null} />))).toEqual(["New password", "Repeat the new password"]);
  });

  it("ask the browser for a new password in both fields and tie the length hint to the first", () => {
    const html = renderToStaticMarkup(<ChoosePasswordForm token="t" email={null} />);
    expect(html.match(/autoComplete="new-password"/g)).toHaveLength(2);
    const [, hintId] = html.match(/aria-describedby="([^"]+)"[^>]*name="password"/) ?? [];
    expect(html).toContain(`<p id="${hintId}" class="text-xs text-ink-muted">At least 8 characters.</p>`);
  });

  it("refuse a repeat that differs, with the message on the repeat, beside the other fields' problems", () => {
    const schema = repeatMustMatch(z.object({ name: z.string().min(1), ...newPasswordTwice }));
    const differs = schema.safeParse({ name: "Ada", password: "geodesic", confirm: "geodesik" });
    expect(differs.error?.issues.map((issue) => [issue.path.join("."), issue.message])).toEqual([["confirm", "The two passwords differ."]]);
    const noName = schema.safeParse({ name: "", password: "geodesic", confirm: "geodesik" });
    expect(noName.error?.issues.map((issue) => issue.path.join("."))).toEqual(["name", "confirm"]);
    expect(schema.safeParse({ name: "Ada", password: "geodesic", confirm: "geodesic" }).success).toBe(true);
  });
});
