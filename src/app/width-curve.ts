/** The width the strip draws at a distance along the port: straight between stations, held constant beyond the ends. */
import type { WidthProfile } from '../document/types.ts';

/** Width at `along` (document units): linear between the two stations around it, the end width beyond either end. */
export function widthAlongPort(profile: WidthProfile, along: number): number {
  const s = profile.stations;
  if (along <= s[0].along) return s[0].width;
  for (let k = 1; k < s.length; k++) {
    if (along <= s[k].along) {
      const t = (along - s[k - 1].along) / (s[k].along - s[k - 1].along);
      return s[k - 1].width + t * (s[k].width - s[k - 1].width);
    }
  }
  return s[s.length - 1].width;
}
