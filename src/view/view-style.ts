/** The view's look in one place: colours, line widths (CSS px) and text. Our own choices, tuned to read over viridis. */

/** Outside the section: dark and neutral so the map's dark end still stands apart from "no air here". */
export const BACKGROUND = '#17191c';

export interface LineStyle {
  readonly colour: string;
  /** CSS px. */
  readonly widthPx: number;
  readonly opacity: number;
  /** Dash and gap lengths, CSS px; absent for a solid line. */
  readonly dashPx?: readonly [number, number];
}

/** Walls crisp and light; inlet and outlet differ in colour and are dashed so they differ without colour too. */
export const WALL_STYLE: LineStyle = { colour: '#eee8da', widthPx: 2.5, opacity: 1 };
export const INLET_STYLE: LineStyle = { colour: '#86c9f2', widthPx: 3, opacity: 1, dashPx: [9, 5] };
export const OUTLET_STYLE: LineStyle = { colour: '#f2a66f', widthPx: 3, opacity: 1, dashPx: [9, 5] };

/** Contours: a thin light line on a dark casing, readable over both ends of the map. */
export const CONTOUR_CASING_STYLE: LineStyle = { colour: '#0c0d0f', widthPx: 3, opacity: 0.45 };
export const CONTOUR_STYLE: LineStyle = { colour: '#f6f5f0', widthPx: 1.25, opacity: 0.9 };

export const STREAMLINE_STYLE: LineStyle = { colour: '#dfe3e8', widthPx: 1, opacity: 0.5 };

/** Flags: a warm coral that no part of viridis comes near. */
export const FLAG_COLOUR = '#ff6f61';
export const FLAG_LINE_STYLE: LineStyle = { colour: FLAG_COLOUR, widthPx: 2, opacity: 1, dashPx: [6, 4] };
export const FLAG_OUTLINE_STYLE: LineStyle = { colour: FLAG_COLOUR, widthPx: 1.5, opacity: 0.9 };
export const HATCH = { colour: FLAG_COLOUR, opacity: 0.85, spacingPx: 8, widthPx: 1.6 } as const;

/** Labels on the overlay. */
export const LABEL_FONT = '600 12px system-ui, "Segoe UI", Roboto, sans-serif';
export const SMALL_FONT = '11px system-ui, "Segoe UI", Roboto, sans-serif';
export const LABEL_TEXT = '#f6f5f0';
export const LABEL_HALO = 'rgba(12, 13, 15, 0.85)';
/** Minimum distance between two labels of the same contour level on screen, CSS px. */
export const LABEL_GAP_PX = 150;
/** Minimum distance between labels of different levels, CSS px: about two label widths. */
export const LABEL_CLEAR_PX = 34;

/** Colour bar box, CSS px. */
export const COLOUR_BAR = { width: 96, barWidth: 16, maxHeight: 260, margin: 12, panel: 'rgba(23, 25, 28, 0.88)' } as const;

/** Space kept free when fitting the section to the view, CSS px. */
export const FIT_INSETS = { left: 24, right: COLOUR_BAR.width + 2 * COLOUR_BAR.margin, top: 24, bottom: 44 } as const;

/** Longest scale bar, CSS px. */
export const SCALE_BAR_MAX_PX = 140;
