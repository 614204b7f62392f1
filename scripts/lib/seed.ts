/**
 * Demo data in the invented scenario of the design: Tallgrass Exteriors of Marrow Creek, and a
 * second company, Bluestem Roofing, to show that tenants never see each other. Idempotent:
 * rows are found by their natural keys and only missing ones are added.
 */
import { randomUUID } from "node:crypto";
import { and, eq, sql as rawSql } from "drizzle-orm";
import { createDb, type Database } from "../../server/db/client.ts";
import { atticSpaces, catalogItems, companies, customers, designOptions, projects, users } from "../../server/db/schema/index.ts";
import { hashPassword } from "../../server/lib/password.ts";
import { catalogItemProblems } from "../../server/modules/catalog/catalog-rules.ts";
import type { Role } from "../../shared/schemas/roles.ts";
import type { ProjectStatus } from "../../shared/schemas/projects.ts";
import { SpaceSurveySchema, type SpaceSurvey } from "../../shared/schemas/survey.ts";
import { CatalogItemInputSchema, type CatalogItem, type CatalogItemInput } from "../../shared/schemas/catalog.ts";
import { DesignOptionInputSchema, type DesignOptionInput } from "../../shared/schemas/options.ts";
import { applyOption, generateOptions } from "../../shared/design/index.ts";
import { toAtticInput } from "../../shared/survey/to-attic-input.ts";
import { analyzeAttic } from "../../shared/ventilation/index.ts";
import type { CodeBasis, RoofColor, VaporRetarder } from "../../shared/ventilation/index.ts";
import { log } from "./paths.ts";
import { seedProposalStory } from "./seed-story.ts";

export const DEMO_PASSWORD = "eavesight-demo";

export const DEMO_USERS: { company: string; email: string; name: string; role: Role }[] = [
  { company: "tallgrass", email: "owner@tallgrass.example", name: "Wren Halloway", role: "owner" },
  { company: "tallgrass", email: "estimator@tallgrass.example", name: "Dale Okafor", role: "estimator" },
  { company: "tallgrass", email: "sales@tallgrass.example", name: "Priya Lindqvist", role: "sales" },
  { company: "tallgrass", email: "crew@tallgrass.example", name: "Ansel Brightwater", role: "crew" },
  { company: "bluestem", email: "owner@bluestem.example", name: "Marcus Tealby", role: "owner" },
];

const DEMO_COMPANIES = [
  {
    slug: "tallgrass", name: "Tallgrass Exteriors", addressLine: "410 Sawmill Road, Marrow Creek", phone: "(555) 014-2290",
    email: "office@tallgrass.example", licenseNumber: "MC-RC-20417", taxRateBasisPoints: 725,
    depositRule: { kind: "percent" as const, value: 10, capCents: 100_000 },
    defaultTerms: "Work is guaranteed for five years against defects in workmanship. Materials carry their makers' warranties. Balance due on completion.",
  },
  {
    slug: "bluestem", name: "Bluestem Roofing", addressLine: "88 Prairie Lane, Marrow Creek", phone: "(555) 014-7781",
    email: "hello@bluestem.example", licenseNumber: "MC-RC-31102", taxRateBasisPoints: 725,
    depositRule: { kind: "percent" as const, value: 10, capCents: 100_000 }, defaultTerms: null,
  },
];

export async function seedAccounts(db: Database): Promise<Record<string, string>> {
  const companyIds: Record<string, string> = {};
  for (const c of DEMO_COMPANIES) {
    await db.insert(companies).values(c).onConflictDoNothing({ target: companies.slug });
    const [row] = await db.select({ id: companies.id }).from(companies).where(rawSql`${companies.slug} = ${c.slug}`);
    companyIds[c.slug] = row!.id;
  }
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const u of DEMO_USERS) {
    const [existing] = await db.select({ id: users.id }).from(users).where(rawSql`lower(${users.email}) = ${u.email}`);
    if (existing) continue;
    await db.insert(users).values({ id: randomUUID(), companyId: companyIds[u.company]!, email: u.email, name: u.name, role: u.role, passwordHash });
  }
  return companyIds;
}

interface DemoCustomer {
  company: string;
  name: string;
  phone?: string;
  email?: string;
  billingAddress?: string;
  notes?: string;
}

export interface DemoProject {
  company: string;
  /** Natural key within the company. */
  title: string;
  customer: string;
  siteAddress: string;
  status: ProjectStatus;
  estimatorEmail: string | null;
  climateZone: number;
  moistureRegime: "A" | "B" | "C" | null;
  codeBasis: CodeBasis;
  ceilingVaporRetarder: VaporRetarder;
  roofColor: RoofColor;
  notes?: string;
  /** Input of SpaceSurveySchema (defaults filled in when seeding). */
  spaces: (Partial<SpaceSurvey> & { name: string })[];
}

export const DEMO_CUSTOMERS: DemoCustomer[] = [
  { company: "tallgrass", name: "Odette Varnum", phone: "(555) 014-3108", email: "odette.varnum@example.com", billingAddress: "214 Thistledown Lane, Marrow Creek" },
  { company: "tallgrass", name: "Silas Brennock", phone: "(555) 014-6621", email: "silas.brennock@example.com", billingAddress: "87 Kestrel Ridge Road, Marrow Creek" },
  { company: "tallgrass", name: "Imogen Farrowby", phone: "(555) 014-2257", email: "imogen.farrowby@example.com", billingAddress: "5 Cattail Court, Marrow Creek" },
  { company: "tallgrass", name: "Theo Quillan", phone: "(555) 014-9034", billingAddress: "1120 Sweetgrass Avenue, Marrow Creek", notes: "Prefers calls after 5 pm." },
  { company: "tallgrass", name: "June Castellane", email: "june.castellane@example.com", billingAddress: "33 Larkspur Way, Marrow Creek" },
  { company: "tallgrass", name: "Amos Whitcombe", phone: "(555) 014-4480", billingAddress: "PO Box 12, Marrow Creek", notes: "Rental property; tenant lets us in." },
  { company: "bluestem", name: "Lorna Pettibone", phone: "(555) 014-7302", billingAddress: "19 Old Mill Crossing, Marrow Creek" },
];

const TALLGRASS_ESTIMATOR = "estimator@tallgrass.example";
const zone4 = { climateZone: 4, moistureRegime: "A" as const, codeBasis: "irc-2018" as const, ceilingVaporRetarder: "none" as const };

export const DEMO_PROJECTS: DemoProject[] = [
  {
    // (a) A powered gable fan high on the gable, a ridge vent beside it and little soffit intake:
    // the fan pulls air in through the ridge (short circuit) and starves for intake. The fan is also dead.
    company: "tallgrass", title: "Varnum attic — gable fan and ridge vent", customer: "Odette Varnum",
    siteAddress: "214 Thistledown Lane, Marrow Creek", status: "surveyed", estimatorEmail: TALLGRASS_ESTIMATOR,
    ...zone4, roofColor: "dark", notes: "Homeowner reports a hot upstairs and a fan that hums but does not turn.",
    spaces: [{
      name: "Main attic",
      roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 80 },
      sections: [{ kind: "rect", lengthFt: 40, widthFt: 30 }],
      vents: [
        { id: "ridge-1", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18, label: "Shingle-over ridge vent" },
        {
          id: "gable-fan-1", kind: "powered-gable", location: "upper", dropBelowRidgeFt: 2, cfm: 1200, mounting: "gable",
          hasThermostat: true, thermostatSetPointF: 100, control: "thermostat", sealedToOpening: true, label: "East gable fan",
          diagnostics: { isPowerVerifiedOff: true, isBladeFreeToSpin: false, windingResistanceOhms: "open" },
        },
        { id: "soffit-1", kind: "soffit-individual", location: "lower", quantity: 6, nfaSqInPerUnit: 50, label: "Rectangular soffit vents" },
      ],
      site: { atmosphericCombustionAppliance: true, gableFanSealed: true, bafflesPresent: true },
      notes: "Fan blade will not turn by hand: sealed bearings seized. Winding reads open (OL) on the meter. Gas water heater in the basement.",
    }],
  },
  {
    // (b) Balanced ridge and continuous soffit meeting 1/300 under the 2018 text in zone 4:
    // 324 sq in upper at the ridge (45 % of the 720 sq in required), 405 sq in low at the eaves.
    company: "tallgrass", title: "Brennock attic — balanced ridge and soffit", customer: "Silas Brennock",
    siteAddress: "87 Kestrel Ridge Road, Marrow Creek", status: "proposed", estimatorEmail: TALLGRASS_ESTIMATOR,
    ...zone4, roofColor: "medium",
    spaces: [{
      name: "Main attic",
      roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 40, eaveLengthFt: 100 },
      sections: [{ kind: "rect", lengthFt: 50, widthFt: 30 }],
      vents: [
        { id: "ridge-1", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 9, label: "Ridge vent" },
        { id: "soffit-1", kind: "soffit-continuous", location: "lower", lengthFt: 90, nfaSqInPerFt: 4.5, label: "Continuous soffit strip" },
      ],
      site: { bafflesPresent: true, ceilingAirSealed: true },
    }],
  },
  {
    // (c) An L-shaped ranch: the main attic as one outline, the attached garage vented on its own.
    company: "tallgrass", title: "Farrowby ranch — L-shaped attic and garage", customer: "Imogen Farrowby",
    siteAddress: "5 Cattail Court, Marrow Creek", status: "proposed", estimatorEmail: TALLGRASS_ESTIMATOR,
    ...zone4, roofColor: "light",
    spaces: [
      {
        name: "Main attic",
        roof: { form: "hip", pitchIn12: 5, ridgeLengthFt: 28, eaveLengthFt: 200 },
        sections: [{ kind: "polygon", id: "main-l", label: "L-shaped house", pointsFt: [[0, 0], [48, 0], [48, 28], [20, 28], [20, 52], [0, 52]], spanFt: 28 }],
        vents: [
          { id: "box-1", kind: "box", location: "upper", quantity: 6, nfaSqInPerUnit: 50, dropBelowRidgeFt: 1.5, label: "Box vents near the ridge" },
          { id: "soffit-1", kind: "soffit-individual", location: "lower", quantity: 12, nfaSqInPerUnit: 40, label: "Round soffit vents" },
        ],
        site: { soffitsBlocked: true, bafflesPresent: false },
        notes: "Blown insulation covers about half the soffit vents on the north leg.",
      },
      {
        name: "Garage attic",
        roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: 24, eaveLengthFt: 48 },
        sections: [{ kind: "rect", lengthFt: 24, widthFt: 22 }],
        vents: [
          { id: "gable-louver-1", kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 18, covering: { mesh: "1/4", louvers: true }, dropBelowRidgeFt: 2, label: "North gable louver" },
          { id: "gable-louver-2", kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 18, covering: { mesh: "1/4", louvers: true }, dropBelowRidgeFt: 2, label: "South gable louver" },
        ],
        site: {},
      },
    ],
  },
  {
    company: "tallgrass", title: "Quillan reroof — add ridge vent", customer: "Theo Quillan",
    siteAddress: "1120 Sweetgrass Avenue, Marrow Creek", status: "lead", estimatorEmail: null, ...zone4, roofColor: "medium",
    notes: "Called about a reroof; wants ventilation looked at while the shingles are off.", spaces: [],
  },
  {
    company: "tallgrass", title: "Castellane attic — bath fan into attic", customer: "June Castellane",
    siteAddress: "33 Larkspur Way, Marrow Creek", status: "sold", estimatorEmail: TALLGRASS_ESTIMATOR, ...zone4, roofColor: "medium",
    spaces: [{
      name: "Main attic",
      roof: { form: "gable", pitchIn12: 8, ridgeLengthFt: 34, eaveLengthFt: 68 },
      sections: [{ kind: "area", areaSqFt: 1020 }],
      vents: [
        { id: "turbine-1", kind: "turbine", location: "upper", quantity: 2, nfaSqInPerUnit: 112, dropBelowRidgeFt: 1 },
        { id: "soffit-1", kind: "soffit-continuous", location: "lower", lengthFt: 60, nfaSqInPerFt: 6 },
      ],
      site: { bathFanIntoAttic: true, moistureOrMould: true },
      notes: "Frost and staining on the sheathing above the bathroom.",
    }],
  },
  {
    company: "tallgrass", title: "Whitcombe rental — turbine replacement", customer: "Amos Whitcombe",
    siteAddress: "402 Old Mill Crossing, Marrow Creek", status: "lost", estimatorEmail: TALLGRASS_ESTIMATOR, ...zone4, roofColor: "dark",
    notes: "Owner wanted the two seized turbines swapped like for like.",
    spaces: [{
      name: "Main attic",
      roof: { form: "gable", pitchIn12: 5, ridgeLengthFt: 32, eaveLengthFt: 64 },
      sections: [{ kind: "rect", lengthFt: 32, widthFt: 26 }],
      vents: [
        { id: "turbine-1", kind: "turbine", location: "upper", quantity: 2, nfaSqInPerUnit: 112, dropBelowRidgeFt: 1, label: "Seized turbines" },
        { id: "soffit-1", kind: "soffit-individual", location: "lower", quantity: 8, nfaSqInPerUnit: 28, label: "Small soffit vents" },
      ],
      site: { bafflesPresent: true },
    }],
  },
  {
    company: "tallgrass", title: "Varnum garage — soffit repair", customer: "Odette Varnum",
    siteAddress: "214 Thistledown Lane, Marrow Creek", status: "completed", estimatorEmail: TALLGRASS_ESTIMATOR, ...zone4, roofColor: "dark",
    spaces: [{
      name: "Garage attic",
      roof: { form: "gable", pitchIn12: 4, ridgeLengthFt: 22, eaveLengthFt: 44 },
      sections: [{ kind: "rect", lengthFt: 22, widthFt: 20 }],
      vents: [{ id: "box-1", kind: "box", location: "upper", quantity: 2, nfaSqInPerUnit: 50, dropBelowRidgeFt: 1, label: "Box vents" }],
      site: {},
      notes: "Rotted soffit boards, no intake left.",
    }],
  },
  {
    company: "bluestem", title: "Pettibone attic survey", customer: "Lorna Pettibone",
    siteAddress: "19 Old Mill Crossing, Marrow Creek", status: "lead", estimatorEmail: null,
    climateZone: 4, moistureRegime: "A", codeBasis: "irc-2018", ceilingVaporRetarder: "none", roofColor: "medium",
    spaces: [{ name: "Main attic", sections: [{ kind: "rect", lengthFt: 36, widthFt: 28 }], vents: [] }],
  },
];

/** Customers, projects and attic spaces of the demo, each added only when its natural key is missing. */
export async function seedSurveys(db: Database, companyIds: Record<string, string>): Promise<void> {
  const customerIds = new Map<string, string>();
  for (const c of DEMO_CUSTOMERS) {
    const companyId = companyIds[c.company]!;
    const find = () => db.select({ id: customers.id }).from(customers).where(and(eq(customers.companyId, companyId), eq(customers.name, c.name))).limit(1);
    let [row] = await find();
    if (!row) {
      [row] = await db.insert(customers).values({ companyId, name: c.name, phone: c.phone ?? null, email: c.email ?? null, billingAddress: c.billingAddress ?? null, notes: c.notes ?? null }).returning({ id: customers.id });
    }
    customerIds.set(`${c.company}/${c.name}`, row!.id);
  }
  for (const p of DEMO_PROJECTS) {
    const companyId = companyIds[p.company]!;
    let [project] = await db.select({ id: projects.id }).from(projects).where(and(eq(projects.companyId, companyId), eq(projects.title, p.title))).limit(1);
    if (!project) {
      const [estimator] = p.estimatorEmail ? await db.select({ id: users.id }).from(users).where(rawSql`lower(${users.email}) = ${p.estimatorEmail}`) : [];
      [project] = await db.insert(projects).values({
        companyId, customerId: customerIds.get(`${p.company}/${p.customer}`)!, title: p.title, siteAddress: p.siteAddress, status: p.status,
        estimatorId: estimator?.id ?? null, climateZone: p.climateZone, moistureRegime: p.moistureRegime, codeBasis: p.codeBasis,
        ceilingVaporRetarder: p.ceilingVaporRetarder, roofColor: p.roofColor, notes: p.notes ?? null,
      }).returning({ id: projects.id });
    }
    // Spaces only go into a project that has none, so a space someone deleted in the demo stays deleted.
    const [hasSpace] = await db.select({ id: atticSpaces.id }).from(atticSpaces).where(eq(atticSpaces.projectId, project!.id)).limit(1);
    if (hasSpace) continue;
    for (const [position, space] of p.spaces.entries()) {
      // Parsed by the same schema the API uses, so demo data can never be something the API would refuse.
      const survey = SpaceSurveySchema.parse({ roof: {}, sections: [], vents: [], ...space });
      await db.insert(atticSpaces).values({ ...survey, companyId, projectId: project!.id, position });
    }
  }
}

/** Input of CatalogItemInputSchema (defaults filled in when seeding). */
type DemoCatalogItem = Partial<CatalogItemInput> & Pick<CatalogItemInput, "sku" | "name" | "kind" | "unit" | "materialCostCents" | "sellPriceCents">;

/**
 * Tallgrass's demo catalog: generic names, no makers or model numbers, prices invented.
 * NFA figures are typical values from memory; a real product's label wins.
 */
export const DEMO_CATALOG: DemoCatalogItem[] = [
  // Ridge vent is priced by the foot and bought in 4 ft pieces.
  { sku: "TG-RIDGE-SO", name: "Shingle-over ridge vent (4 ft pieces)", kind: "ridge", unit: "linear-ft", nfaSqInPerFt: 18, soldInLengthFt: 4, materialCostCents: 375, sellPriceCents: 1_150, laborMinutesPerUnit: 6 },
  { sku: "TG-SOFFIT-STRIP", name: "Continuous soffit vent strip (8 ft pieces)", kind: "soffit-continuous", unit: "linear-ft", nfaSqInPerFt: 9, soldInLengthFt: 8, materialCostCents: 160, sellPriceCents: 650, laborMinutesPerUnit: 5 },
  { sku: "TG-SOFFIT-RND4", name: "Round soffit vent, 4 in", kind: "soffit-individual", unit: "each", nfaSqInPerUnit: 7, materialCostCents: 140, sellPriceCents: 650, laborMinutesPerUnit: 10 },
  { sku: "TG-SOFFIT-1608", name: "Rectangular soffit vent, 16 × 8 in", kind: "soffit-individual", unit: "each", nfaSqInPerUnit: 56, materialCostCents: 320, sellPriceCents: 1_400, laborMinutesPerUnit: 15 },
  { sku: "TG-BOX-50", name: "Static box roof vent", kind: "box", unit: "each", nfaSqInPerUnit: 50, materialCostCents: 1_250, sellPriceCents: 4_800, laborMinutesPerUnit: 45 },
  { sku: "TG-OFFRIDGE-4", name: "Off-ridge vent, 4 ft", kind: "off-ridge", unit: "each", nfaSqInPerUnit: 72, materialCostCents: 3_600, sellPriceCents: 9_800, laborMinutesPerUnit: 60 },
  { sku: "TG-TURBINE-12", name: "Turbine vent, 12 in", kind: "turbine", unit: "each", nfaSqInPerUnit: 112, materialCostCents: 3_100, sellPriceCents: 11_500, laborMinutesPerUnit: 60 },
  { sku: "TG-GABLE-FAN", name: "Gable-mount attic fan with thermostat, 1,200 cfm", kind: "powered-gable", unit: "each", cfm: 1_200, materialCostCents: 9_800, sellPriceCents: 32_500, laborMinutesPerUnit: 120 },
  { sku: "TG-BAFFLE", name: "Insulation baffle (vent chute)", kind: "baffle", unit: "each", materialCostCents: 160, sellPriceCents: 550, laborMinutesPerUnit: 5 },
  { sku: "TG-DECK-CUT", name: "Cut roof deck slot for ridge vent", kind: "deck-cut", unit: "linear-ft", materialCostCents: 0, sellPriceCents: 325, laborMinutesPerUnit: 3 },
  { sku: "TG-PATCH-VENT", name: "Patch and shingle a removed roof vent opening", kind: "patch-vent-opening", unit: "each", materialCostCents: 1_400, sellPriceCents: 9_500, laborMinutesPerUnit: 60 },
  { sku: "TG-SEAL-GABLE", name: "Seal a gable fan opening (blocking, sheathing, siding)", kind: "seal-gable-opening", unit: "each", materialCostCents: 2_200, sellPriceCents: 12_500, laborMinutesPerUnit: 90 },
  { sku: "TG-ELEC-DISC", name: "Electrical disconnect of a fan by a licensed electrician", kind: "electrical-disconnect", unit: "each", materialCostCents: 9_000, sellPriceCents: 17_500, laborMinutesPerUnit: 0 },
  { sku: "TG-INSUL-CLEAR", name: "Clear insulation at the eaves", kind: "insulation-clearing", unit: "hour", materialCostCents: 0, sellPriceCents: 8_500, laborMinutesPerUnit: 60 },
  { sku: "TG-BATH-DUCT", name: "Duct a bath fan to a roof cap (insulated duct, cap and flashing)", kind: "bath-fan-duct", unit: "each", materialCostCents: 6_500, sellPriceCents: 34_500, laborMinutesPerUnit: 120 },
  { sku: "TG-LABOR", name: "Labour", kind: "labor", unit: "hour", materialCostCents: 0, sellPriceCents: 7_500, laborMinutesPerUnit: 60 },
];

/** The demo catalog for Tallgrass, each item added only when its code is missing (an owner's edits are kept). */
export async function seedCatalog(db: Database, companyIds: Record<string, string>): Promise<void> {
  const companyId = companyIds.tallgrass!;
  for (const item of DEMO_CATALOG) {
    // Parsed by the API's own schema, so the demo catalog is always something the API would accept.
    const values = CatalogItemInputSchema.parse(item);
    const problems = catalogItemProblems(values);
    if (Object.keys(problems).length) throw new Error(`demo catalog item ${item.sku}: ${JSON.stringify(problems)}`);
    await db.insert(catalogItems).values({ ...values, companyId }).onConflictDoNothing();
  }
}

/** The demo project with a powered gable fan beside a ridge vent: the one the saved demo options are for. */
export const FAN_AND_RIDGE_TITLE = "Varnum attic — gable fan and ridge vent";
export const DEMO_OPTION_NAMES = ["Ridge and soffit (remove fan)", "Keep a gable fan, close the ridge, add intake"] as const;

/**
 * Two saved options for the fan-and-ridge demo: the generator's ridge-and-soffit proposal (the
 * fan comes out, so nothing short-circuits the ridge), and a hand-built contrast that keeps a
 * powered fan (a new one in the old opening), closes the ridge and adds intake. The first must
 * meet the code: analyzeAttic checks it here, so a broken demo fails loudly.
 */
export function demoOptions(project: DemoProject, spaceId: string, space: SpaceSurvey, catalog: readonly CatalogItem[]): DesignOptionInput[] {
  const bySku = (sku: string) => {
    const item = catalog.find((c) => c.sku === sku);
    if (!item) throw new Error(`demo catalog item ${sku} is missing`);
    return item.id;
  };
  const generated = generateOptions({ project, spaceId, space, catalog }).options.find((o) => o.type === "ridge-and-continuous-soffit");
  const ridgeAndSoffit = DesignOptionInputSchema.parse(generated
    ? { ...generated.option, name: DEMO_OPTION_NAMES[0], isKept: true }
    : {
        name: DEMO_OPTION_NAMES[0], origin: "manual",
        spaces: [{
          spaceId, ventActions: { "gable-fan-1": "remove" },
          added: [
            { id: "strip", catalogItemId: bySku("TG-SOFFIT-STRIP"), quantity: 48 },
            { id: "seal", catalogItemId: bySku("TG-SEAL-GABLE"), quantity: 1 },
            { id: "disconnect", catalogItemId: bySku("TG-ELEC-DISC"), quantity: 1 },
          ],
        }],
      });
  const keepFan = DesignOptionInputSchema.parse({
    name: DEMO_OPTION_NAMES[1],
    notes: "A powered attic fan can depressurize the house and backdraft the gas water heater: a combustion safety test with the fan running is part of this option. The ridge slot is closed so the fan draws through the soffits, not the ridge.",
    spaces: [{
      spaceId,
      ventActions: { "gable-fan-1": "replace", "ridge-1": "remove" },
      added: [
        { id: "fan", catalogItemId: bySku("TG-GABLE-FAN"), quantity: 1, replacesVentId: "gable-fan-1" },
        { id: "strip", catalogItemId: bySku("TG-SOFFIT-STRIP"), quantity: 80 },
        { id: "rect", catalogItemId: bySku("TG-SOFFIT-1608"), quantity: 3 },
      ],
      siteFixes: { sealsGableFan: true },
    }],
    laborLines: [{ id: "close-ridge", description: "Close the ridge slot: deck strips and cap shingles", hours: 3, rateCents: 7_500 }],
  });
  const first = analyzeAttic(toAtticInput(project, applyOption(space, ridgeAndSoffit.spaces[0]!, catalog)));
  if (!first.compliant) throw new Error(`demo option "${DEMO_OPTION_NAMES[0]}" does not meet the code: ${first.summary}`);
  return [ridgeAndSoffit, keepFan];
}

/** The demo options, added only to the fan-and-ridge project while it has none (so deleted ones stay deleted). */
export async function seedOptions(db: Database, companyIds: Record<string, string>): Promise<void> {
  const companyId = companyIds.tallgrass!;
  const demo = DEMO_PROJECTS.find((p) => p.title === FAN_AND_RIDGE_TITLE);
  if (!demo) throw new Error(`the demo project "${FAN_AND_RIDGE_TITLE}" is missing from DEMO_PROJECTS`);
  const [project] = await db.select({ id: projects.id }).from(projects).where(and(eq(projects.companyId, companyId), eq(projects.title, demo.title))).limit(1);
  if (!project) return;
  const [hasOption] = await db.select({ id: designOptions.id }).from(designOptions).where(eq(designOptions.projectId, project.id)).limit(1);
  if (hasOption) return;
  const [space] = await db.select().from(atticSpaces).where(and(eq(atticSpaces.projectId, project.id), eq(atticSpaces.name, "Main attic"))).limit(1);
  if (!space) return;
  const catalog = await db.select().from(catalogItems).where(eq(catalogItems.companyId, companyId));
  const survey = SpaceSurveySchema.parse(space);
  for (const [position, option] of demoOptions(demo, space.id, survey, catalog).entries()) {
    await db.insert(designOptions).values({ ...option, companyId, projectId: project.id, position });
  }
}

export async function seedDemo(databaseUrl: string): Promise<void> {
  const { db, sql } = createDb(databaseUrl, { max: 2 });
  try {
    const companyIds = await seedAccounts(db);
    await seedSurveys(db, companyIds);
    await seedCatalog(db, companyIds);
    await seedOptions(db, companyIds);
    await seedProposalStory(db, companyIds);
    log("demo data seeded (Tallgrass Exteriors, Bluestem Roofing)");
  } finally {
    await sql.end();
  }
}
