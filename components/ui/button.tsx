import type { ButtonHTMLAttributes } from "react";

type Tone = "primary" | "quiet" | "danger";

const tones: Record<Tone, string> = {
  primary: "bg-accent text-paper hover:bg-accent-deep border-accent",
  quiet: "bg-transparent text-ink hover:bg-paper-deep border-paper-edge",
  danger: "bg-transparent text-alarm hover:bg-alarm-wash border-alarm",
};

/** Class list for links that should look like buttons. */
export function buttonClasses(tone: Tone = "primary", extra = ""): string {
  return `inline-flex items-center justify-center gap-2 rounded-md border px-4 py-2 text-sm font-medium no-underline transition-colors disabled:cursor-not-allowed disabled:opacity-55 ${tones[tone]} ${extra}`;
}

export function Button({
  tone = "primary",
  className = "",
  type = "button",
  ...props
}: ButtonHTMLAttributes<HTMLButtonElement> & { tone?: Tone }) {
  return <button type={type} className={buttonClasses(tone, className)} {...props} />;
}
