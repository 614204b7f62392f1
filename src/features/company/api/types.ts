import type { EstimateConditions } from "@shared/airflow-model/index";
import type { CodeBasis } from "@shared/ventilation/index";
import type { DepositRule } from "@shared/proposals/types";

/** The company profile as GET|PATCH /api/company answer it (server/modules/proposals/company.service.ts). */
export interface CompanyProfile {
  id: string;
  name: string;
  licenseNumber: string | null;
  addressLine: string | null;
  phone: string | null;
  email: string | null;
  defaultTerms: string | null;
  taxRateBasisPoints: number;
  depositRule: DepositRule | null;
  isCoolingOffNoticeEnabled: boolean;
  reminderDays: number | null;
  /** How the 1/300 route's 40–50 % is read: of the required area (the code text) or of the area provided. */
  upperShareBase: "required" | "provided";
  estimateConditions: EstimateConditions;
  /** What new projects start with. */
  defaultCodeBasis: CodeBasis;
  defaultClimateZone: number;
  unitSystem: "imperial" | "metric";
  /** Crew members see prices and the balance on their job sheets. */
  isCrewShownPrices: boolean;
  /** Printed on every completion report. */
  warrantyTerms: string | null;
  logo: { contentType: string | null; sha256: string | null; url: string } | null;
}
