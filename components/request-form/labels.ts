// The rider's words for each answer value come from the shop's one vocabulary (lib/labels.ts).
export {
  SKILL_LABELS,
  STYLE_LABELS,
  DISCIPLINE_LABELS,
  TERRAIN_LABELS,
  JUMP_LABELS,
  COMPLAINT_LABELS,
  RATE_BASIS_LABELS,
  labelOf as label,
} from "@/lib/labels";
