import type { ComponentProps, ReactNode } from "react";
import { Button } from "./button";

/** A form's submit button: says what is happening while the form is sent (`busy`), and cannot be pressed twice meanwhile. */
export function SubmitButton({ pending, busy, disabled, children, ...props }: ComponentProps<typeof Button> & { pending: boolean; busy: ReactNode }) {
  return (
    <Button type="submit" disabled={pending || disabled} {...props}>
      {pending ? busy : children}
    </Button>
  );
}
