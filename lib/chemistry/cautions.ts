/** The cautions every result screen shows beside pressure numbers. */
export const SAFETY_CAUTIONS = [
  'Glass under pressure can burst and injure. These numbers are estimates, not a guarantee.',
  'Use only bottles made for carbonated drinks, and stay within the rating your bottle supplier gives.',
  'Keep conditioned bottles cold once they reach their fizz: warmth raises the pressure and restarts fermentation.',
  'Open a test bottle first, pointed away from people, and wear eye protection when handling warm bottles.',
  'Follow your local food-safety, labelling and alcohol rules and licensed practice.',
] as const;
