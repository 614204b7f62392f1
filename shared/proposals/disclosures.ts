/**
 * The fixed texts a proposal carries: the consent to sign electronically (ESIGN Act,
 * 15 U.S.C. §7001(c): right to paper, how to withdraw, what is needed to open the record),
 * the three-day cancellation notice for sales made at the home (FTC Cooling-Off Rule,
 * 16 CFR 429.1, whose wording is prescribed), and the safety cautions of DESIGN.md §7.
 * A change to the consent text must bump its version: acceptances record the version signed.
 */
import { isLegalPublicHoliday } from "./legal-holidays";

export const ESIGN_CONSENT_VERSION = "esign-2026-12-01";

export function esignDisclosure(companyName: string): string[] {
  return [
    `By ticking the box and signing, you agree to sign this proposal electronically and to receive it and the records about it from ${companyName} electronically. Your electronic signature has the same effect as a signature on paper.`,
    `You may ask for a paper copy at no charge: contact ${companyName} using the details on the proposal. A signed copy is also e-mailed to you as a PDF.`,
    `You may withdraw this consent before you sign by simply not signing and contacting ${companyName}; the proposal can then be signed on paper. Withdrawing consent does not undo a signature already given.`,
    "To open and keep these records you need a device with a current web browser, an e-mail account, and a program that opens PDF files (most phones and computers have one built in). Keep your e-mail address up to date with us.",
  ];
}

/** The buyer's cancellation notice of 16 CFR 429.1(a) and the form of 429.1(b), filled in. */
export function coolingOffNotice(opts: { companyName: string; companyAddress: string | null; transactionDate: string; cancelByDate: string }): string[] {
  const seller = [opts.companyName, opts.companyAddress].filter(Boolean).join(", ");
  return [
    "You, the buyer, may cancel this transaction at any time prior to midnight of the third business day after the date of this transaction. See the attached notice of cancellation form for an explanation of this right.",
    "NOTICE OF CANCELLATION",
    `Date of transaction: ${opts.transactionDate}`,
    "You may cancel this transaction, without any penalty or obligation, within three business days from the above date.",
    "If you cancel, any property traded in, any payments made by you under the contract or sale, and any negotiable instrument executed by you will be returned within ten business days following receipt by the seller of your cancellation notice, and any security interest arising out of the transaction will be cancelled.",
    "If you cancel, you must make available to the seller at your residence, in substantially as good condition as when received, any goods delivered to you under this contract or sale, or you may, if you wish, comply with the instructions of the seller regarding the return shipment of the goods at the seller's expense and risk.",
    "If you do make the goods available to the seller and the seller does not pick them up within twenty days of the date of your notice of cancellation, you may retain or dispose of the goods without any further obligation. If you fail to make the goods available to the seller, or if you agree to return the goods to the seller and fail to do so, then you remain liable for performance of all obligations under the contract.",
    `To cancel this transaction, mail or deliver a signed and dated copy of this cancellation notice, or any other written notice, or send a telegram, to ${seller} not later than midnight of ${opts.cancelByDate}.`,
    "I hereby cancel this transaction.   Date: ____________   Buyer's signature: ______________________________",
  ];
}

/**
 * The third business day after a date, for the cooling-off notice: every day counts except Sundays
 * (16 CFR 429.0(c) counts Saturdays) and the legal public holidays (see legal-holidays.ts).
 *
 * @example
 * thirdBusinessDayAfter("2026-12-04") // "2026-12-08" (Fri → Sat 5, Mon 7, Tue 8)
 * thirdBusinessDayAfter("2026-11-24") // "2026-11-28" (Tue → Wed 25, Thanksgiving skipped, Fri 27, Sat 28)
 */
export function thirdBusinessDayAfter(isoDate: string): string {
  const day = new Date(`${isoDate}T12:00:00Z`);
  let counted = 0;
  while (counted < 3) {
    day.setUTCDate(day.getUTCDate() + 1);
    if (day.getUTCDay() !== 0 && !isLegalPublicHoliday(day.toISOString().slice(0, 10))) counted++;
  }
  return day.toISOString().slice(0, 10);
}

/**
 * The cautions a proposal gives the homeowner (DESIGN.md §7), in their words: how the crew works
 * safely, who does the electrical work, and the backdraft danger of a powered fan, whenever the
 * attic has one now or any option includes one. The technician's step-by-step instructions
 * (cautions.ts) belong to the survey and the crew's sheet, not to the homeowner's copy.
 */
export const HOMEOWNER_WORK_CAUTION =
  "Our crew works in your attic and on your roof with fall protection and the usual precautions for attic heat and insulation dust. Please keep children and pets away from the work area while we are there.";
export const HOMEOWNER_FAN_WIRING_CAUTION =
  "Any work on an attic fan's wiring is done by a licensed electrician, with the circuit switched off at the breaker and confirmed dead with a voltage tester first.";
export const HOMEOWNER_BACKDRAFT_CAUTION =
  "A powered attic fan can pull air out of the house through gaps in the ceiling and make a natural-draft gas water heater, furnace or boiler spill its exhaust, including carbon monoxide, into your home. " +
  "Where a fan stays or is added, a qualified technician should run a combustion safety test with the fan running and the ceiling's air leaks should be sealed; keep working carbon monoxide alarms on every floor.";
export const HOMEOWNER_CODES_NOTE =
  "All work follows the manufacturers' instructions, the local building code and the authority having jurisdiction; electrical work is done by a licensed electrician.";

export function proposalCautions(opts: { hasPoweredFanNow: boolean; hasPoweredFanInAnyOption: boolean }): string[] {
  const cautions = [HOMEOWNER_WORK_CAUTION];
  if (opts.hasPoweredFanNow || opts.hasPoweredFanInAnyOption) cautions.push(HOMEOWNER_FAN_WIRING_CAUTION, HOMEOWNER_BACKDRAFT_CAUTION);
  cautions.push(HOMEOWNER_CODES_NOTE);
  return cautions;
}
