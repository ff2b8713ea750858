export interface FridgeJar {
  jarId: string;
  code: string;
  productId: string;
  productName: string;
  productColour: string;
  openedOn: string;
  useBy: string;
  daysOpen: number;
  /** negative once the use-by has passed */
  daysLeft: number;
  unsealed: boolean;
  capacityTbsp: number;
  remainingTbsp: number;
  /** what the week's plan takes from this jar before its use-by */
  plannedTbsp: number;
  /** what will be left on the use-by day: the plan's estimate, or what is in the jar when nothing is planned */
  estimateTbsp: number;
  estimateFrom: 'plan' | 'jar';
}

export interface FridgeView {
  today: string;
  jars: FridgeJar[];
  unsealedAdvice: string;
}
