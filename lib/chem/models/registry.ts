/** All activity models by id; an unknown id is a ChemInputError on the "model" field. */
import { ChemInputError } from "../errors";
import { daviesModel } from "./davies";
import { dhExtendedModel } from "./dh-extended";
import { dhLimitingModel } from "./dh-limiting";
import { guntelbergModel } from "./guntelberg";
import { pitzerModel } from "./pitzer";
import { sitModel } from "./sit";
import { truesdellJonesModel } from "./truesdell-jones";
import type { ActivityModel, ActivityModelId } from "./types";

export const MODEL_REGISTRY: Partial<Record<ActivityModelId, ActivityModel>> = {
  "dh-limiting": dhLimitingModel,
  "dh-extended": dhExtendedModel,
  guntelberg: guntelbergModel,
  davies: daviesModel,
  "truesdell-jones": truesdellJonesModel,
  pitzer: pitzerModel,
  sit: sitModel,
};

export type RequestedModel = ActivityModelId | "auto";

export function getModel(id: string): ActivityModel {
  const model = MODEL_REGISTRY[id as ActivityModelId];
  if (model) return model;
  const available = ["auto", ...Object.keys(MODEL_REGISTRY)].join(", ");
  throw new ChemInputError(`Unknown activity model "${id}". Available models: ${available}.`, {
    field: "model",
    code: "unknown_model",
  });
}

export interface ActivityModelSummary {
  id: RequestedModel;
  label: string;
  formulaTex: string;
  validityNote: string;
}

/** The models a user can pick, "auto" first (for the solution block's model menu). */
export function listActivityModels(): ActivityModelSummary[] {
  return [
    {
      id: "auto",
      label: "Automatic (best model in range)",
      formulaTex: "",
      validityNote: "Chooses by composition, ionic strength and solvent, and says why.",
    },
    ...Object.values(MODEL_REGISTRY).map((m) => ({
      id: m.id,
      label: m.label,
      formulaTex: m.formulaTex,
      validityNote: m.validityNote ?? "",
    })),
  ];
}

export const ACTIVITY_MODELS: readonly ActivityModelSummary[] = listActivityModels();
