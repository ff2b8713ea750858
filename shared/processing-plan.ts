// The processing plan for a batch made from a recipe: the domain's plan, after checking the recipe has a tested time for it.
import {
  afterProcessingSteps,
  cautionsFor,
  isPressureMethod,
  processingPlan,
  type AltitudeRow,
  type JarSize,
  type Method,
  type PlanQuantities,
  type ProcessingPlan,
  type UnitSystem,
} from './domain';
import { JAR_SIZE_NAMES, planQuantities } from './words';

export interface PlanRecipe {
  method: Method;
  baseMinutes: Partial<Record<JarSize, number>>;
  ph: number | null;
  acidified: boolean;
  altitudeTable: AltitudeRow[] | null;
}

export interface ProcessingQuestion {
  method: Method;
  jarSize: JarSize;
  altitudeFt: number;
  /** The household's units, for the quantities in the cautions and reasons; US customary when left out. */
  unitSystem?: UnitSystem;
}

function refused(method: Method, reason: string, quantities: PlanQuantities): ProcessingPlan {
  return {
    allowed: false,
    minutes: null,
    pressurePsi: null,
    reasons: [reason],
    cautions: cautionsFor(method, quantities),
    afterProcessing: afterProcessingSteps(method),
    altitudeAddMinutes: null,
  };
}

/** Pressure times are tested for pressure canners only; boiling-water times serve the steam canner too (the domain checks its limits). */
function methodFits(recipeMethod: Method, batchMethod: Method): boolean {
  return isPressureMethod(recipeMethod) === isPressureMethod(batchMethod);
}

export function recipeProcessingPlan(recipe: PlanRecipe, question: ProcessingQuestion): ProcessingPlan {
  const quantities = planQuantities(question.unitSystem ?? 'us');
  if (!methodFits(recipe.method, question.method)) {
    return refused(
      question.method,
      isPressureMethod(recipe.method)
        ? 'This recipe is tested for a pressure canner only; there is no tested time for another canner.'
        : 'This recipe is tested for a boiling-water canner; there is no tested pressure time for it. Use a recipe tested for the pressure canner.',
      quantities,
    );
  }
  const baseMinutes = recipe.baseMinutes[question.jarSize];
  if (baseMinutes === undefined) {
    const sizes = Object.keys(recipe.baseMinutes).map((size) => JAR_SIZE_NAMES[size as JarSize]);
    return refused(
      question.method,
      `The recipe has no tested time for ${JAR_SIZE_NAMES[question.jarSize]} jars; use ${sizes.length ? sizes.join(' or ') : 'a size it gives a time for'} jars.`,
      quantities,
    );
  }
  return processingPlan({
    method: question.method,
    altitudeFt: question.altitudeFt,
    jarSize: question.jarSize,
    baseMinutes,
    ...(recipe.ph === null ? {} : { ph: recipe.ph }),
    acidified: recipe.acidified,
    ...(recipe.altitudeTable ? { altitudeTable: recipe.altitudeTable } : {}),
    quantities,
  });
}
