import { Button } from "@/components/ui/button";

type SubmitProps = { sending: boolean; label: string; sendingLabel: string; disabled?: boolean };

/** A form's submit button: while the form is being sent it says so and cannot be pressed again. */
export function SubmitButton({ sending, label, sendingLabel, disabled = false }: SubmitProps) {
  return (
    <Button type="submit" disabled={disabled || sending}>
      {sending ? sendingLabel : label}
    </Button>
  );
}

/** The submit button alone at the foot of the form, on the right. */
export function SubmitRow(props: SubmitProps) {
  return (
    <div className="flex justify-end">
      <SubmitButton {...props} />
    </div>
  );
}
