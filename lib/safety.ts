/**
 * The usual saw cautions (OSHA 29 CFR 1910.213 for guards, spreaders and anti-kickback devices; push sticks within
 * 6″ / 152 mm of the blade is common practice). Kerfwise shows them; the machine's manual, local codes and licensed
 * practice decide.
 */
export const SAW_CAUTIONS = [
  'Keep the blade guard, riving knife or splitter and anti-kickback pawls in place.',
  'Use a push stick or push block whenever a hand would come within 6″ (150 mm) of the blade.',
  'Rip against the fence and crosscut with the mitre gauge or sled — never freehand, never both at once.',
  'Never rip a strip narrower than your saw allows between blade and fence: cut it off the free side, or on a sled, track saw or band saw.',
  'Use featherboards where the guard must come off (grooves, rabbets); put it back right after.',
  'Wear eye and hearing protection and run dust collection; take dull blades out of service.',
  'Follow your saw’s manual, local codes and licensed practice: they decide, not this list.',
] as const;
