import { WATER_MOLAR_MASS_KG_PER_MOL } from "../../../constants";

/**
 * Constants of the Pitzer equations that are the same for every salt.
 * b = 1.2 kg^½ mol^−½: Pitzer (1973) J. Phys. Chem. 77, 268, chosen once for all electrolytes.
 * Default α values by charge type (Pitzer & Mayorga 1973; Pitzer & Mayorga 1974 for 2:2):
 * α1 = 2.0 with no β2 for 1:1, 1:2, 2:1, 3:1, 4:1, 5:1 salts; α1 = 1.4 and α2 = 12 for 2:2
 * (and higher symmetric) salts. Each parameter row carries its own α, so these are only
 * the fall-backs for rows that leave them blank.
 * M_w: molar mass of water, the one constant lib/chem uses everywhere (../../../constants).
 */
export const PITZER_UNIVERSAL = {
  b: 1.2,
  alpha1Default: 2.0,
  alpha1TwoTwo: 1.4,
  alpha2TwoTwo: 12,
  waterMolarMassKgPerMol: WATER_MOLAR_MASS_KG_PER_MOL,
} as const;
