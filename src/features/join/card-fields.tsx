/** The card part of the purchase and renewal forms: number, expiry, security code. */
import { TextField } from "@/components/ui/field";

type CardFieldName = "cardNumber" | "cardExpiry" | "cardCvc";
export interface FieldProps {
  value: string;
  onChange: (e: React.ChangeEvent<HTMLInputElement>) => void;
  error: string | undefined;
}

export const EMPTY_CARD = { cardNumber: "", cardExpiry: "", cardCvc: "" };

export function CardFields({ testMode, field }: { testMode: boolean; field: (name: CardFieldName) => FieldProps }) {
  return (
    <fieldset className="space-y-4">
      <legend className="eyebrow text-ember-700">Card{testMode ? " (test card)" : ""}</legend>
      <TextField label="Card number" autoComplete="cc-number" inputMode="numeric" maxLength={23} {...field("cardNumber")} />
      <div className="grid grid-cols-2 gap-4">
        <TextField label="Expiry (MM/YY)" autoComplete="cc-exp" inputMode="numeric" placeholder="MM/YY" maxLength={7} {...field("cardExpiry")} />
        <TextField label="Security code" autoComplete="cc-csc" inputMode="numeric" maxLength={4} {...field("cardCvc")} />
      </div>
    </fieldset>
  );
}

/** Shown under either form when payments go to the built-in test service. */
export function TestCardNote({ className }: { className?: string }) {
  return (
    <p className={className}>
      This demo uses a built-in test payment service. No real money moves and no card is charged. Use the test card{" "}
      <span className="font-mono whitespace-nowrap">4242 4242 4242 4242</span> with any future expiry date and any 3 digits;{" "}
      <span className="font-mono whitespace-nowrap">4000 0000 0000 0002</span> shows a declined card.
    </p>
  );
}
