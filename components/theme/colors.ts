import { lightColors } from '@/components/theme/palette';

/** Native draws from the light scheme for now; the web follows the system or the person's choice (colors.web.ts). */
export const colors: Record<keyof typeof lightColors, string> = lightColors;
