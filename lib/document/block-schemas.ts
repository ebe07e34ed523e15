import { z } from "@/lib/validation/zod";

/**
 * Input schemas of the two live blocks. The node views and the server share these, so the
 * browser never drifts from what a save accepts.
 *
 * The limits here are about shape and size, not chemistry: a negative amount or a
 * temperature outside a solvent's range must still save, so the block can show the
 * engine's message in place while the rest of the entry keeps saving (bad input is a
 * typed error, docs/architecture.md, "The computation contract"). Only values no chemist could mean (non-finite numbers, 10 MB strings, a
 * thousand rows) are refused here.
 */

export const AMOUNT_UNITS = [
  "mol/kg",
  "mmol/kg",
  "mol/L",
  "mmol/L",
  "µmol/L",
  "g",
  "mg",
  "g/L",
  "wt%",
  "mass fraction",
] as const;
export type AmountUnit = (typeof AMOUNT_UNITS)[number];

/** Units of the `per` basis: a mass is the mass of solvent, a volume the final volume. */
export const PER_UNITS = ["g", "kg", "mL", "L"] as const;

/** Units that need a `per` basis (an absolute quantity weighed out). */
export const UNITS_NEEDING_PER: readonly AmountUnit[] = ["g", "mg"];

const MODEL_CHOICES = [
  "auto",
  "dh-limiting",
  "dh-extended",
  "guntelberg",
  "davies",
  "truesdell-jones",
  "pitzer",
  "sit",
] as const;

export const REFERENCE_ELECTRODE_IDS = [
  "SHE",
  "SCE",
  "Ag/AgCl-satKCl",
  "Ag/AgCl-3.5MKCl",
  "Ag/AgCl-3MKCl",
  "Hg/HgO-1MNaOH",
  "Hg/Hg2SO4-satK2SO4",
  "RHE",
] as const;

/** A stable block id: letters, digits, "-" and "_" (UUIDs fit). */
const blockIdSchema = z
  .string()
  .min(4)
  .max(64)
  .regex(/^[A-Za-z0-9_-]+$/, "A block id uses only letters, digits, - and _.");

const shortText = (max: number) => z.string().max(max);
/** A finite number inside generous physical bounds; null while a field is empty. */
const boundedNumber = (min: number, max: number) => z.number().finite().min(min).max(max);

const solutionComponentSchema = z.strictObject({
  formula: shortText(80),
  amount: boundedNumber(-1e9, 1e9).nullable(),
  unit: z.enum(AMOUNT_UNITS),
  perAmount: boundedNumber(-1e9, 1e9).nullable().optional(),
  perUnit: z.enum(PER_UNITS).nullable().optional(),
});
export type SolutionComponentInput = z.infer<typeof solutionComponentSchema>;

/** Volumes of a dilution: the stock taken and the final volume it is made up to. */
export const VOLUME_UNITS = ["µL", "mL", "L"] as const;
export type VolumeUnit = (typeof VOLUME_UNITS)[number];

/**
 * A stock this solution is made from: a solution block of an entry of the same lab, at the
 * revision used. Only the reference and the volume taken are stored; the stock's composition
 * is read from that revision's stored result (never from the client).
 */
const stockRefSchema = z.strictObject({
  entryId: z.uuid("An entry id is a UUID."),
  blockId: blockIdSchema,
  revision: z.number().int().min(1).max(1_000_000_000),
  volume: boundedNumber(-1e9, 1e9).nullable(),
  volumeUnit: z.enum(VOLUME_UNITS),
});
export type StockRef = z.infer<typeof stockRefSchema>;

/** "V₁ of stock A (and B…) made up to V₂", plus the block's own component rows. */
const dilutionSchema = z.strictObject({
  stocks: z.array(stockRefSchema).max(10),
  finalVolume: boundedNumber(-1e9, 1e9).nullable(),
  finalVolumeUnit: z.enum(VOLUME_UNITS),
});
export type DilutionInput = z.infer<typeof dilutionSchema>;

export const solutionBlockInputSchema = z.strictObject({
  blockId: blockIdSchema,
  name: shortText(120),
  solvent: shortText(40),
  temperatureC: boundedNumber(-273.15, 1000).nullable(),
  densityGPerMl: boundedNumber(-100, 100).nullable().optional(),
  model: z.enum(MODEL_CHOICES),
  components: z.array(solutionComponentSchema).max(40),
  /** Made from stocks: null (or absent, in documents saved before lineage) when not. */
  dilution: dilutionSchema.nullable().optional(),
});
export type SolutionBlockInput = z.infer<typeof solutionBlockInputSchema>;

/** What the working electrode's radius field takes, mm: a 10 nm nanoelectrode to a 10 cm disk. */
export const WORKING_ELECTRODE_RADIUS_MM = { min: 1e-5, max: 100 } as const;

const electrodeSchema = z.strictObject({
  material: shortText(80),
  areaCm2: boundedNumber(-1e6, 1e6).nullable(),
  pretreatment: z.array(shortText(300)).max(20),
});
export type ElectrodeInput = z.infer<typeof electrodeSchema>;

export const cellBlockInputSchema = z.strictObject({
  blockId: blockIdSchema,
  name: shortText(120),
  cellType: shortText(80),
  workingElectrode: electrodeSchema,
  counterElectrode: electrodeSchema,
  referenceElectrode: electrodeSchema.extend({ type: z.enum(REFERENCE_ELECTRODE_IDS) }),
  /** blockId of a solution block in the same entry; may dangle after that block is deleted. */
  electrolyteBlockId: blockIdSchema.nullable(),
  purgeGas: shortText(40),
  purgeMinutes: boundedNumber(-1e6, 1e6).nullable(),
  temperatureC: boundedNumber(-273.15, 1000).nullable(),
  instrument: shortText(120),
  channel: shortText(40),
  /** Couple id from lib/chem's catalogue, e.g. "Fe3+/Fe2+". */
  couple: shortText(60).nullable(),
  /** Needed only for the RHE scale. */
  pH: boundedNumber(-20, 30).nullable(),
  /*
   * Added with the cell's electrochemistry (issue 14). Optional, so documents stored before
   * still validate; a missing value reads as null / false.
   */
  /** Radius of the disk working electrode, mm (10 nm to 10 cm): R_u and the Randles–Ševčík area. */
  workingElectrodeRadiusMm: boundedNumber(
    WORKING_ELECTRODE_RADIUS_MM.min,
    WORKING_ELECTRODE_RADIUS_MM.max,
  )
    .nullable()
    .optional(),
  /** Include the liquid junction (Henderson) in potentials against the reference electrode. */
  applyJunctionPotential: z.boolean().optional(),
  /** A redox probe of lib/chem's catalogue, for the expected reversible peak current. */
  redoxProbe: z
    .strictObject({
      /** lib/chem's probe id, e.g. "ferricyanide/ferrocyanide". */
      probe: shortText(60),
      /** The form in the solution; the first sweep converts it. */
      form: z.enum(["oxidized", "reduced"]),
      /** Null: read from the linked solution when it holds that species. */
      concentrationMmolPerL: boundedNumber(-1e6, 1e6).nullable(),
      scanRateMVPerS: boundedNumber(-1e9, 1e9).nullable(),
    })
    .nullable()
    .optional(),
});
export type CellBlockInput = z.infer<typeof cellBlockInputSchema>;
export type RedoxProbeChoice = NonNullable<CellBlockInput["redoxProbe"]>;

const attachmentIdSchema = z.uuid("An attachment id is a UUID.");

/**
 * A trace block: an instrument export attached to the entry, plotted. Only the choices of how
 * to show it are stored; the data stay in the file and are read back on demand.
 */
export const traceBlockInputSchema = z.strictObject({
  blockId: blockIdSchema,
  attachmentId: attachmentIdSchema,
  name: shortText(120),
  /** A cell block of the same entry, for the electrode area (current density). */
  cellBlockId: blockIdSchema.nullable(),
  showCurrentDensity: z.boolean(),
  /** Show potentials against this reference electrode instead of the file's own. */
  potentialScale: z.enum(REFERENCE_ELECTRODE_IDS).nullable(),
  /** Cycles shown (voltammetry); null: all. */
  cycles: z.array(z.number().int().min(1).max(100_000)).max(10_000).nullable(),
});
export type TraceBlockInput = z.infer<typeof traceBlockInputSchema>;

/** A photo attached to the entry, shown as a figure with a caption. */
export const attachmentFigureSchema = z.strictObject({
  attachmentId: attachmentIdSchema,
  caption: shortText(500),
});

/** Any other attached file, shown as a link to download it. */
export const attachmentFileSchema = z.strictObject({
  attachmentId: attachmentIdSchema,
  name: shortText(200),
});
