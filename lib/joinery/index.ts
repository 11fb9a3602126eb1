export { sizeDrawerSchedule, type SizeDrawerScheduleResult } from '@/lib/joinery/size-drawer-schedule';
export { boxFromOpening } from '@/lib/joinery/box-from-opening';
export { JOINT_NAMES, jointCorners, type Corner, type JointCorners, type BoxThickness } from '@/lib/joinery/joint-rules';
export { requiredSetupCards, findSetupCard, defaultSetupCard, DEFAULT_LOCK_RABBET_CARDS, SETUP_CARD_TOLERANCE_MM } from '@/lib/joinery/setup-cards';
export { ROUTER_TABLE_CAUTIONS, maxRouterSpeedRpm } from '@/lib/joinery/router-safety';
export { DRAWER_DEFAULTS, IMPERIAL_SLIDE_LENGTHS, METRIC_SLIDE_LENGTHS } from '@/lib/joinery/defaults';
export type * from '@/lib/joinery/types';
