/** Checks the shape of a computeSolution input before any chemistry is done. */
import { ChemInputError } from "../errors";
import type { ActivityModelId } from "../models/types";
import type { SolutionInput } from "./types";

export function validateSolutionInput(input: SolutionInput): {
  temperatureC: number;
  solventId: string;
  requested: ActivityModelId | "auto";
  density: number | undefined;
} {
  if (!input || typeof input !== "object")
    throw new ChemInputError("No solution was given.", { code: "empty_solution" });
  const temperatureC = input.temperatureC ?? 25;
  if (typeof temperatureC !== "number" || !Number.isFinite(temperatureC)) {
    throw new ChemInputError("The temperature must be a number in °C.", {
      field: "temperatureC",
      code: "bad_temperature",
    });
  }
  if (!Array.isArray(input.components) || input.components.length === 0) {
    throw new ChemInputError(
      "The solution has no components: add at least one salt, acid, base or ion.",
      { field: "components", code: "empty_solution" },
    );
  }
  input.components.forEach((c, i) => {
    if (!c || typeof c.formula !== "string" || c.formula.trim() === "") {
      throw new ChemInputError(`Component ${i + 1} has no formula.`, {
        field: `components[${i}].formula`,
        code: "bad_formula",
      });
    }
  });
  const density = input.densityGPerMl ?? undefined;
  if (
    density !== undefined &&
    (typeof density !== "number" || !Number.isFinite(density) || density <= 0 || density > 5)
  ) {
    throw new ChemInputError(
      `A solution density of ${String(density)} g/mL is not plausible (expected a positive number below 5 g/mL).`,
      { field: "densityGPerMl", code: "bad_density" },
    );
  }
  const requested = input.model ?? "auto";
  if (typeof requested !== "string")
    throw new ChemInputError('The model must be a model id or "auto".', {
      field: "model",
      code: "unknown_model",
    });
  const daviesCoefficient = input.modelOptions?.daviesCoefficient;
  if (daviesCoefficient !== undefined && daviesCoefficient !== 0.2 && daviesCoefficient !== 0.3) {
    throw new ChemInputError("The Davies coefficient must be 0.3 or 0.2.", {
      field: "modelOptions.daviesCoefficient",
      code: "bad_option",
    });
  }
  return { temperatureC, solventId: input.solvent ?? "water", requested, density };
}
