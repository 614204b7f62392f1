/** GET and POST /api/public/verify (server/modules/proposals/proposals.service.ts `VerifyAnswer`), as JSON. */
export type VerifyAnswer =
  | { sha256: string; matches: false }
  | {
      sha256: string;
      matches: true;
      document: {
        kind: "sent" | "signed" | "change-order";
        companyName: string;
        revision: number;
        changeOrderNumber: number | null;
        status: string;
        sentAt: string | null;
        signedAt: string | null;
        decidedAt: string | null;
        isSuperseded: boolean;
      };
    };
