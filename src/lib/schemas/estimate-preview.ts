/**
 * Request body of `POST /api/estimates/preview`: a layered soil profile, a water table, one
 * surface load, drainage boundaries and optional ramp construction, vertical drains and
 * calculation options. The consolidation engine (`src/lib/consolidation/preview.ts`) takes the
 * parsed value.
 *
 * Units follow `unitSystem` and are named on each field:
 * | quantity | SI | US |
 * | --- | --- | --- |
 * | depth, thickness, width, spacing | m | ft |
 * | stress, pressure, σ'p | kPa | psf |
 * | unit weight | kN/m³ | pcf |
 * | cv, ch | m²/yr | ft²/day |
 * | mv | m²/MN | ft²/kip |
 * | drain width, thickness, diameter | mm | in |
 * | drain discharge capacity qw | m³/yr | ft³/yr |
 * | time | years | years |
 *
 * Every object is strict (unknown keys are refused) so a form can show one message per field.
 * No defaults are filled in here; the engine applies them and reports what it used.
 */
import { z } from 'zod';

const unknownKeys = (where: string) => ({
  error: (issue: { code?: string; keys?: string[] }) =>
    issue.code === 'unrecognized_keys'
      ? `${where} has field(s) it does not use: ${(issue.keys ?? []).join(', ')}. Remove them or check the spelling.`
      : undefined,
});

const finiteNumber = (message: string) => z.number({ error: message });

/** A number that must be > 0; `what` names the field and its units. */
const positiveNumber = (what: string) =>
  finiteNumber(`${what} must be a number.`).positive({ error: `${what} must be greater than 0.` });

const nonNegativeNumber = (what: string) =>
  finiteNumber(`${what} must be a number.`).min(0, { error: `${what} must be 0 or more.` });

/**
 * Ways to give an uncertain parameter. The engine's deterministic ("likely") run uses each
 * distribution's median; the Monte Carlo run samples it.
 * - normal: mean and standard deviation sd (sd 0 = no spread). Truncated at 0 for quantities
 *   that cannot be negative.
 * - lognormal: arithmetic mean and sd of the quantity itself (not of its logarithm); the usual
 *   choice for cv, ch and permeability.
 * - triangular: min ≤ mode ≤ max.
 * - p10p50p90: the bank's 10th, 50th and 90th percentiles; the engine samples a distribution
 *   that passes through all three (Johnson quantile-parameterized, Hadlock & Bickel 2017).
 */
function distributionSchema(what: string, allowZero: boolean) {
  const centre = allowZero ? nonNegativeNumber : positiveNumber;
  const normal = z.strictObject(
    {
      type: z.literal('normal'),
      mean: centre(`${what}: mean`),
      sd: nonNegativeNumber(`${what}: standard deviation (sd)`),
    },
    unknownKeys(`${what} (normal distribution)`),
  );
  const lognormal = z.strictObject(
    {
      type: z.literal('lognormal'),
      mean: positiveNumber(`${what}: mean (of the value itself, not its logarithm)`),
      sd: nonNegativeNumber(`${what}: standard deviation (sd, of the value itself)`),
    },
    unknownKeys(`${what} (log-normal distribution)`),
  );
  const triangular = z
    .strictObject(
      {
        type: z.literal('triangular'),
        min: centre(`${what}: min`),
        mode: centre(`${what}: mode`),
        max: centre(`${what}: max`),
      },
      unknownKeys(`${what} (triangular distribution)`),
    )
    .refine((d) => d.min <= d.mode && d.mode <= d.max, {
      error: `${what}: a triangular distribution needs min ≤ mode ≤ max. Reorder the three values.`,
      path: ['mode'],
    });
  const percentiles = z
    .strictObject(
      {
        type: z.literal('p10p50p90'),
        p10: centre(`${what}: P10`),
        p50: centre(`${what}: P50`),
        p90: centre(`${what}: P90`),
      },
      unknownKeys(`${what} (P10/P50/P90)`),
    )
    .refine((d) => d.p10 <= d.p50 && d.p50 <= d.p90, {
      error: `${what}: percentiles must satisfy P10 ≤ P50 ≤ P90. Reorder the three values.`,
      path: ['p50'],
    });
  return [normal, lognormal, triangular, percentiles] as const;
}

const distributionTypes = "'normal', 'lognormal', 'triangular' or 'p10p50p90'";

/** A parameter given as a number or as a distribution. */
function parameter(what: string, opts: { allowZero?: boolean } = {}) {
  const allowZero = opts.allowZero ?? false;
  const value = allowZero ? nonNegativeNumber(what) : positiveNumber(what);
  return z.union(
    [
      value,
      z.discriminatedUnion('type', distributionSchema(what, allowZero), {
        error: (issue) =>
          issue.code === 'invalid_union' ? `${what}: distribution type must be ${distributionTypes}.` : undefined,
      }),
    ],
    { error: `${what} must be a number or a distribution object with type ${distributionTypes}.` },
  );
}

/** Linear variation with depth within one layer: `top` at the layer top, `bottom` at its base. */
function linearProfile(what: string) {
  return z.strictObject(
    {
      type: z.literal('linear'),
      top: positiveNumber(`${what} at the top of the layer`),
      bottom: positiveNumber(`${what} at the bottom of the layer`),
    },
    unknownKeys(`${what} (linear profile)`),
  );
}

/** A parameter that may also vary linearly with depth (σ'p, OCR). */
function depthParameter(what: string) {
  return z.union(
    [
      positiveNumber(what),
      z.discriminatedUnion('type', [...distributionSchema(what, false), linearProfile(what)], {
        error: (issue) =>
          issue.code === 'invalid_union'
            ? `${what}: type must be ${distributionTypes} or 'linear' (a profile with depth).`
            : undefined,
      }),
    ],
    {
      error: `${what} must be a number, a distribution (type ${distributionTypes}) or a profile {"type":"linear","top":…,"bottom":…}.`,
    },
  );
}

/** Published Cα/Cc groups (Mesri & Godlewski 1977; Terzaghi, Peck & Mesri 1996). */
export const cAlphaOverCcGroups = ['inorganic-clay-silt', 'organic-clay-silt', 'peat'] as const;

const layerSchema = z
  .strictObject(
    {
      /** Label shown in results, e.g. "Saltreach Estuarine Clay". */
      name: z
        .string({ error: 'Layer name must be text.' })
        .trim()
        .min(1, { error: 'Give each layer a name (1 to 80 characters).' })
        .max(80, { error: 'Layer name is too long: use at most 80 characters.' }),
      /** Layer thickness, m (SI) or ft (US). */
      thickness: positiveNumber('Layer thickness (m or ft)').max(500, {
        error: 'Layer thickness must be at most 500 (m or ft); split the profile or check the units.',
      }),
      /** Bulk unit weight above the water table, kN/m³ (SI) or pcf (US). */
      unitWeightAboveWater: positiveNumber('Unit weight above the water table (kN/m³ or pcf)'),
      /** Saturated unit weight below the water table, kN/m³ (SI) or pcf (US). */
      unitWeightBelowWater: positiveNumber('Saturated unit weight below the water table (kN/m³ or pcf)'),
      /**
       * false for sand, gravel or stiff layers that add weight, do not settle and drain freely.
       * Omitted means compressible.
       */
      compressible: z.boolean({ error: 'compressible must be true or false.' }).optional(),
      /** Compression index Cc (dimensionless). */
      cc: parameter('Cc (compression index)').optional(),
      /** Recompression (swelling) index Cr (dimensionless). */
      cr: parameter('Cr (recompression index)', { allowZero: true }).optional(),
      /** Initial void ratio e0 (dimensionless). */
      e0: parameter('e0 (initial void ratio)').optional(),
      /** Coefficient of volume compressibility mv instead of Cc/Cr, m²/MN (SI) or ft²/kip (US). */
      mv: parameter('mv (coefficient of volume compressibility, m²/MN or ft²/kip)').optional(),
      /** Preconsolidation pressure σ'p, kPa (SI) or psf (US); a number, distribution or linear profile. */
      sigmaP: depthParameter("σ'p (preconsolidation pressure, kPa or psf)").optional(),
      /** Overconsolidation ratio OCR = σ'p/σ'v0; a number, distribution or linear profile. */
      ocr: depthParameter('OCR (overconsolidation ratio)').optional(),
      /** Coefficient of consolidation cv, m²/yr (SI) or ft²/day (US). */
      cv: parameter('cv (coefficient of consolidation, m²/yr or ft²/day)').optional(),
      /** Secondary compression index Cα (Δe per log10 cycle of time). */
      cAlpha: parameter('Cα (secondary compression index)', { allowZero: true }).optional(),
      /** Cα/Cc as a value or distribution, or a published group (Mesri & Godlewski 1977). */
      cAlphaOverCc: z
        .union([z.enum(cAlphaOverCcGroups), parameter('Cα/Cc', { allowZero: true })], {
          error: `Cα/Cc must be a number, a distribution, or one of ${cAlphaOverCcGroups.join(', ')}.`,
        })
        .optional(),
      /** Correlation coefficient between Cc and e0 in normal-score space, −0.99…0.99. */
      ccE0Correlation: finiteNumber('Cc–e0 correlation must be a number between −0.99 and 0.99.')
        .min(-0.99, { error: 'Cc–e0 correlation must be at least −0.99.' })
        .max(0.99, { error: 'Cc–e0 correlation must be at most 0.99.' })
        .optional(),
    },
    unknownKeys('A layer'),
  )
  .superRefine((layer, ctx) => {
    const add = (path: string, message: string) => ctx.addIssue({ code: 'custom', path: [path], message });
    if (layer.compressible === false) return;
    const usesIndices = layer.cc !== undefined || layer.cr !== undefined;
    if (layer.mv !== undefined && usesIndices) {
      add('mv', 'Give either mv or Cc/Cr for a layer, not both. Remove mv or remove Cc and Cr.');
    }
    if (layer.mv === undefined) {
      if (layer.cc === undefined) add('cc', 'Give Cc (compression index), or mv instead of Cc/Cr.');
      if (layer.cr === undefined)
        add('cr', 'Give Cr (recompression index); it is typically 5–10 % of Cc (UFC 3-220-10 §5-5.2.1).');
      if (layer.e0 === undefined) add('e0', 'Give e0 (initial void ratio); Cc and Cr are used as Cc/(1+e0).');
      if (layer.sigmaP === undefined && layer.ocr === undefined)
        add('ocr', "Give σ'p (sigmaP) or OCR; use ocr: 1 for a normally consolidated layer.");
    }
    if (layer.sigmaP !== undefined && layer.ocr !== undefined) {
      add('ocr', "Give either σ'p (sigmaP) or OCR, not both.");
    }
    if (layer.cv === undefined) add('cv', 'Give cv (coefficient of consolidation) for every compressible layer.');
    if (layer.cAlpha !== undefined && layer.cAlphaOverCc !== undefined) {
      add('cAlphaOverCc', 'Give either Cα or Cα/Cc, not both.');
    }
    if (layer.cAlphaOverCc !== undefined && layer.cc === undefined) {
      add('cAlphaOverCc', 'Cα/Cc needs Cc. With mv, give Cα and e0 instead.');
    }
    if (layer.cAlpha !== undefined && layer.e0 === undefined) {
      add('e0', 'Secondary compression uses Cα/(1+e0): give e0.');
    }
    if (layer.ccE0Correlation !== undefined && (layer.cc === undefined || layer.e0 === undefined)) {
      add('ccE0Correlation', 'A Cc–e0 correlation needs both Cc and e0.');
    }
  });

const fillPressureFields = {
  /** Applied surface pressure q, kPa (SI) or psf (US). Alternative to fillHeight × fillUnitWeight. */
  pressure: positiveNumber('Load pressure q (kPa or psf)').optional(),
  /** Fill height, m (SI) or ft (US); q = fillHeight × fillUnitWeight. */
  fillHeight: positiveNumber('Fill height (m or ft)').optional(),
  /** Fill unit weight, kN/m³ (SI) or pcf (US). */
  fillUnitWeight: positiveNumber('Fill unit weight (kN/m³ or pcf)').optional(),
};

function checkFillPressure(
  load: { pressure?: number | undefined; fillHeight?: number | undefined; fillUnitWeight?: number | undefined },
  ctx: z.RefinementCtx,
) {
  const byHeight = load.fillHeight !== undefined || load.fillUnitWeight !== undefined;
  if (load.pressure !== undefined && byHeight) {
    ctx.addIssue({
      code: 'custom',
      path: ['pressure'],
      message: 'Give either pressure or fillHeight with fillUnitWeight, not both.',
    });
  } else if (load.pressure === undefined && !byHeight) {
    ctx.addIssue({ code: 'custom', path: ['pressure'], message: 'Give the load pressure, or fillHeight and fillUnitWeight.' });
  } else if (byHeight && (load.fillHeight === undefined || load.fillUnitWeight === undefined)) {
    ctx.addIssue({
      code: 'custom',
      path: [load.fillHeight === undefined ? 'fillHeight' : 'fillUnitWeight'],
      message: 'Give both fillHeight and fillUnitWeight (their product is the pressure).',
    });
  }
}

const offset = (what: string) => finiteNumber(`${what} must be a number (m or ft); 0 is the centre.`).optional();

const loadSchema = z.discriminatedUnion(
  'type',
  [
    /** Fill much wider than the compressible depth: Δσ = q at every depth. */
    z
      .strictObject({ type: z.literal('wideFill'), ...fillPressureFields }, unknownKeys('The wide fill load'))
      .superRefine(checkFillPressure),
    /** Symmetric embankment of trapezoidal section, infinitely long. */
    z
      .strictObject(
        {
          type: z.literal('embankment'),
          ...fillPressureFields,
          /** Crest (top) width, m or ft; 0 gives a triangular section. */
          crestWidth: nonNegativeNumber('Embankment crest width (m or ft)'),
          /** Horizontal length of each side slope, m or ft. */
          sideSlopeWidth: positiveNumber('Embankment side-slope horizontal width (m or ft)'),
          /** Horizontal distance of the settlement point from the centreline, m or ft. */
          pointOffset: offset('Embankment point offset'),
        },
        unknownKeys('The embankment load'),
      )
      .superRefine(checkFillPressure),
    /** Uniformly loaded rectangle (Boussinesq). */
    z.strictObject(
      {
        type: z.literal('rectangle'),
        pressure: positiveNumber('Load pressure q (kPa or psf)'),
        width: positiveNumber('Rectangle width B (m or ft)'),
        length: positiveNumber('Rectangle length L (m or ft)'),
        /** Offset of the point from the centre along the width, m or ft. */
        pointX: offset('Rectangle point offset along the width (pointX)'),
        /** Offset of the point from the centre along the length, m or ft. */
        pointY: offset('Rectangle point offset along the length (pointY)'),
      },
      unknownKeys('The rectangle load'),
    ),
    /** Uniformly loaded strip, infinitely long (Boussinesq). */
    z.strictObject(
      {
        type: z.literal('strip'),
        pressure: positiveNumber('Load pressure q (kPa or psf)'),
        width: positiveNumber('Strip width B (m or ft)'),
        pointOffset: offset('Strip point offset'),
      },
      unknownKeys('The strip load'),
    ),
    /** Uniformly loaded circle (Boussinesq). */
    z.strictObject(
      {
        type: z.literal('circle'),
        pressure: positiveNumber('Load pressure q (kPa or psf)'),
        diameter: positiveNumber('Circle diameter (m or ft)'),
        pointOffset: offset('Circle point offset'),
      },
      unknownKeys('The circular load'),
    ),
    /** 2:1 spread of a rectangle, strip or circle: average stress below the loaded area. */
    z
      .strictObject(
        {
          type: z.literal('twoToOne'),
          shape: z.enum(['rectangle', 'strip', 'circle'], {
            error: "2:1 shape must be 'rectangle', 'strip' or 'circle'.",
          }),
          pressure: positiveNumber('Load pressure q (kPa or psf)'),
          width: positiveNumber('Loaded width B (m or ft)').optional(),
          length: positiveNumber('Loaded length L (m or ft)').optional(),
          diameter: positiveNumber('Loaded diameter (m or ft)').optional(),
        },
        unknownKeys('The 2:1 load'),
      )
      .superRefine((load, ctx) => {
        const need = (field: 'width' | 'length' | 'diameter', ok: boolean, message: string) => {
          if (!ok) ctx.addIssue({ code: 'custom', path: [field], message });
        };
        if (load.shape === 'circle') {
          need('diameter', load.diameter !== undefined, 'A 2:1 circle needs its diameter.');
          need('width', load.width === undefined && load.length === undefined, 'A 2:1 circle takes diameter only.');
        } else {
          need('width', load.width !== undefined, `A 2:1 ${load.shape} needs its width.`);
          need('diameter', load.diameter === undefined, `A 2:1 ${load.shape} takes no diameter.`);
          if (load.shape === 'rectangle') need('length', load.length !== undefined, 'A 2:1 rectangle needs its length.');
          else need('length', load.length === undefined, 'A 2:1 strip is infinitely long: remove length.');
        }
      }),
  ],
  {
    error: (issue) =>
      issue.code === 'invalid_union'
        ? "Load type must be 'wideFill', 'embankment', 'rectangle', 'strip', 'circle' or 'twoToOne'."
        : undefined,
  },
);

const boundary = (where: string) =>
  z.enum(['pervious', 'impervious'], { error: `${where} drainage must be 'pervious' or 'impervious'.` });

const drainSchema = z.discriminatedUnion(
  'type',
  [
    z.strictObject(
      {
        type: z.literal('band'),
        /** Band (prefabricated) drain width a, mm (SI) or in (US). */
        width: positiveNumber('Band drain width (mm or in)'),
        /** Band drain thickness b, mm (SI) or in (US). */
        thickness: positiveNumber('Band drain thickness (mm or in)'),
      },
      unknownKeys('The band drain'),
    ),
    z.strictObject(
      {
        type: z.literal('circular'),
        /** Drain diameter dw, mm (SI) or in (US). */
        diameter: positiveNumber('Drain diameter (mm or in)'),
      },
      unknownKeys('The circular drain'),
    ),
  ],
  { error: (i) => (i.code === 'invalid_union' ? "Drain type must be 'band' or 'circular'." : undefined) },
);

const verticalDrainsSchema = z
  .strictObject(
    {
      pattern: z.enum(['square', 'triangular'], { error: "Drain pattern must be 'square' or 'triangular'." }),
      /** Centre-to-centre drain spacing S, m (SI) or ft (US). */
      spacing: positiveNumber('Drain spacing (m or ft)'),
      drain: drainSchema,
      /** Smear zone: ratio ds/dw (≥ 1) and kh/ks (≥ 1). Omitted: no smear. */
      smear: z
        .strictObject(
          {
            ratio: finiteNumber('Smear ratio ds/dw must be a number.').min(1, {
              error: 'Smear ratio ds/dw must be at least 1 (1 = no smear zone).',
            }),
            khOverKs: finiteNumber('kh/ks must be a number.').min(1, {
              error: 'kh/ks must be at least 1 (1 = no smear).',
            }),
          },
          unknownKeys('The smear zone'),
        )
        .optional(),
      /** Drain discharge capacity qw, m³/yr (SI) or ft³/yr (US). Omitted: no well resistance. */
      dischargeCapacity: positiveNumber('Drain discharge capacity qw (m³/yr or ft³/yr)').optional(),
      /** Horizontal coefficient of consolidation ch, m²/yr (SI) or ft²/day (US), for every layer. */
      ch: parameter('ch (horizontal coefficient of consolidation, m²/yr or ft²/day)').optional(),
      /** ch/cv ratio applied to each layer's cv. */
      chOverCv: parameter('ch/cv').optional(),
    },
    unknownKeys('Vertical drains'),
  )
  .superRefine((drains, ctx) => {
    if ((drains.ch === undefined) === (drains.chOverCv === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['ch'], message: 'Give exactly one of ch or chOverCv for the drains.' });
    }
  });

const sublayerSchema = z.discriminatedUnion(
  'mode',
  [
    z.strictObject(
      {
        mode: z.literal('auto'),
        /** Stop refining when the total changes by less than this, % (default 0.5). */
        tolerancePercent: finiteNumber('Sublayer tolerance must be a number (%).')
          .min(0.01, { error: 'Sublayer tolerance must be at least 0.01 %.' })
          .max(10, { error: 'Sublayer tolerance must be at most 10 %.' })
          .optional(),
        /** Upper limit of sublayers per layer (default 128). */
        maxPerLayer: z
          .int({ error: 'maxPerLayer must be a whole number.' })
          .min(1, { error: 'maxPerLayer must be at least 1.' })
          .max(512, { error: 'maxPerLayer must be at most 512.' })
          .optional(),
      },
      unknownKeys('Sublayer options'),
    ),
    z.strictObject(
      {
        mode: z.literal('fixed'),
        /** Sublayers per compressible layer. */
        perLayer: z
          .int({ error: 'perLayer must be a whole number.' })
          .min(1, { error: 'perLayer must be at least 1.' })
          .max(512, { error: 'perLayer must be at most 512.' }),
      },
      unknownKeys('Sublayer options'),
    ),
  ],
  { error: (i) => (i.code === 'invalid_union' ? "Sublayer mode must be 'auto' or 'fixed'." : undefined) },
);

const optionsSchema = z.strictObject(
  {
    /** Time after loading at which secondary compression is reported, years (default 50). */
    designLifeYears: positiveNumber('Design life (years)')
      .max(1000, { error: 'Design life must be at most 1000 years.' })
      .optional(),
    /** Times after the start of loading at which settlement is reported, years (up to 50). */
    timePointsYears: z
      .array(positiveNumber('Each time point (years)'), { error: 'timePointsYears must be a list of numbers.' })
      .max(50, { error: 'Give at most 50 time points.' })
      .optional(),
    monteCarlo: z
      .strictObject(
        {
          /** Number of realisations (default 5000). */
          realisations: z
            .int({ error: 'Realisations must be a whole number.' })
            .min(100, { error: 'Use at least 100 realisations for meaningful P10/P90.' })
            .max(20000, { error: 'Use at most 20000 realisations.' })
            .optional(),
          /** Seed of the random number generator (default 1); the same seed gives the same result. */
          seed: z
            .int({ error: 'Seed must be a whole number.' })
            .min(0, { error: 'Seed must be 0 or more.' })
            .max(4294967295, { error: 'Seed must be at most 4294967295.' })
            .optional(),
        },
        unknownKeys('Monte Carlo options'),
      )
      .optional(),
    sublayers: sublayerSchema.optional(),
    /** Unit weight of water, kN/m³ (SI, default 9.81) or pcf (US, default 62.4). */
    waterUnitWeight: positiveNumber('Unit weight of water (kN/m³ or pcf)').optional(),
  },
  unknownKeys('Options'),
);

export const estimatePreviewSchema = z
  .strictObject(
    {
      unitSystem: z.enum(['SI', 'US'], { error: "unitSystem must be 'SI' or 'US'." }),
      /** Depth of the water table below ground level, m (SI) or ft (US). */
      waterTableDepth: nonNegativeNumber('Water table depth below ground (m or ft)'),
      /** Layers from the ground surface down; the base of the last layer is incompressible. */
      layers: z
        .array(layerSchema, { error: 'layers must be a list of layer objects.' })
        .min(1, { error: 'Give at least one layer.' })
        .max(30, { error: 'Give at most 30 layers.' }),
      load: loadSchema,
      drainage: z.strictObject(
        {
          /** Boundary at the ground surface (top of the first layer). */
          top: boundary('Top'),
          /** Boundary at the base of the last layer. */
          bottom: boundary('Bottom'),
        },
        unknownKeys('Drainage'),
      ),
      /** Construction (ramp loading) period, years; omitted = load applied at once. */
      constructionTimeYears: positiveNumber('Construction time (years)').optional(),
      verticalDrains: verticalDrainsSchema.optional(),
      options: optionsSchema.optional(),
    },
    unknownKeys('The estimate'),
  )
  .superRefine((input, ctx) => {
    const freeDraining = input.layers.some((l) => l.compressible === false);
    if (input.drainage.top === 'impervious' && input.drainage.bottom === 'impervious' && !freeDraining) {
      ctx.addIssue({
        code: 'custom',
        path: ['drainage', 'top'],
        message: 'With both boundaries impervious the clay cannot drain: make the top or the bottom pervious.',
      });
    }
    if (!input.layers.some((l) => l.compressible !== false)) {
      ctx.addIssue({ code: 'custom', path: ['layers'], message: 'At least one layer must be compressible.' });
    }
  });

/** Parsed request body (what `previewEstimate` takes). */
export type EstimatePreviewInput = z.output<typeof estimatePreviewSchema>;
/** Raw request body before parsing (what a form builds). */
export type EstimatePreviewBody = z.input<typeof estimatePreviewSchema>;
export type EstimateLayerInput = EstimatePreviewInput['layers'][number];
export type EstimateLoadInput = EstimatePreviewInput['load'];
export type EstimateVerticalDrainsInput = NonNullable<EstimatePreviewInput['verticalDrains']>;
/** A parameter value: a number or a distribution object. */
export type ParameterInput = NonNullable<EstimateLayerInput['cc']>;
/** σ'p or OCR: a number, a distribution or a linear profile. */
export type DepthParameterInput = NonNullable<EstimateLayerInput['sigmaP']>;
