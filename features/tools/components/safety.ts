export const BOX_CAUTION =
  'Cutting and routing baffles: wear eye and hearing protection and follow the tool maker\'s instructions. In vehicles, follow the vehicle maker\'s instructions, local codes and licensed practice.';

export const LEVEL_CAUTION = 'Measuring at high levels can damage hearing: wear protection and keep loud tests short.';
