/**
 * Plain-word cautions printed on cut diagrams and stencils (PRODUCT.md §5). Wording follows the
 * suggested text of REFERENCES.md §9 (IARC classes for wood dust and formaldehyde; glass and mineral
 * wool irritate skin, eyes and airways; saw guards, riving knife, push sticks). No exposure numbers:
 * the texts defer to local rules and the tool maker's instructions.
 */

export const CAUTION_DUST =
  'Dust: cutting and sanding MDF, plywood and other wood panels makes fine dust that can harm your lungs; wood dust and formaldehyde are classified as causing cancer in people. Work with dust extraction or outdoors, and wear a well-fitted respirator (for example FFP2/FFP3 or N95/P100) and eye and hearing protection.';

export const CAUTION_SAW =
  "Saws and routers: follow the tool maker's instructions. Keep guards and the riving knife fitted, use push sticks, never stand in line with the blade, and disconnect the power before changing blades or bits.";

export const CAUTION_LIFTING =
  'Lifting: a full sheet is heavy and awkward. Get help or use a panel trolley or sheet carrier, bend your knees, and keep your back straight.';

export const CAUTION_FIBRES =
  'Lining: cutting fibre batt sheds fibres; glass or mineral wool irritates skin, eyes and airways. Wear gloves, long sleeves and a mask, and cut with a sharp knife against a straight edge, away from your body.';

export const CAUTION_LOCAL_RULES = 'Follow your local health-and-safety rules.';

/** Cautions for the cut diagrams (panels and lining). */
export const CUT_DIAGRAM_CAUTIONS: readonly string[] = [CAUTION_DUST, CAUTION_SAW, CAUTION_LIFTING, CAUTION_FIBRES, CAUTION_LOCAL_RULES];

/** The short caution on every stencil page. */
export const STENCIL_CAUTION = `Caution: ${CAUTION_FIBRES.replace(/^Lining: /, '')} ${CAUTION_LOCAL_RULES}`;

/** One line for the foot of each cut diagram page. */
export const CUT_DIAGRAM_FOOT_CAUTION =
  'Caution: wood dust harms your lungs — use dust extraction and a respirator; keep saw guards fitted; get help lifting full sheets. Follow local rules and the tool maker’s instructions.';
