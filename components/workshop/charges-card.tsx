import { Card } from "@/components/ui/card";
import type { Charges } from "@/db/queries/workshop";
import { minorExponent, toDecimalString } from "@/lib/money";
import { bpToPercentText } from "@/lib/workshop/charges-schema";
import { ChargesForm } from "./charges-form";
import { ChargesLine, ChargesSummary, NoRateNote } from "./charges-summary";

/** The Charges card of /workshop: editable for the owner, figures only for technicians. Never rendered for apprentices. */
export function ChargesCard({ charges, owner }: { charges: Charges; owner: boolean }) {
  return (
    <Card>
      <h2 className="mb-3 text-lead font-bold">Charges</h2>
      {charges.hourlyRateMinor <= 0 ? <NoRateNote owner={owner} /> : owner ? <ChargesLine charges={charges} /> : null}
      {owner ? (
        <ChargesForm
          currencyLocked={charges.currencyLocked}
          initial={{
            currency: charges.currency,
            hourlyRate: toDecimalString(charges.hourlyRateMinor, minorExponent(charges.currency)),
            taxRate: bpToPercentText(charges.taxRateBp),
          }}
        />
      ) : (
        <>
          <ChargesSummary charges={charges} />
          <p className="mt-3 text-note text-muted">Estimates price labour at this rate. Only an owner can change it.</p>
        </>
      )}
    </Card>
  );
}
