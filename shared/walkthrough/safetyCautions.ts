/** A short safety note shown beside the walkthrough's steps and on its printout. */
export interface SafetyCaution {
  readonly kind: 'needle' | 'rotary-cutter' | 'iron';
  readonly text: string;
}

/**
 * Cautions for the work a walkthrough asks for. Machine quilting always means a moving needle; a rotary cutter or
 * an iron is mentioned only when the lesson's own words mention trimming/cutting or pressing/ironing.
 * Each caution defers to the machine's or tool's manual: we give habits, not the maker's instructions.
 * (General workshop safety habits, common practice, no source.)
 */
export function findSafetyCautions(texts: readonly string[]): SafetyCaution[] {
  const all = texts.join('\n').toLowerCase();
  const cautions: SafetyCaution[] = [
    {
      kind: 'needle',
      text: 'Keep your fingers clear of the needle and out from under the presser foot while the machine runs. Stop with the needle down and lower or lift the presser foot as your machine\'s manual says; turn the machine off before threading, changing the needle or the bobbin.',
    },
  ];
  if (/\b(trim|trimming|trimmed|cut|cutting|rotary)\b/.test(all)) {
    cautions.push({
      kind: 'rotary-cutter',
      text: 'When trimming, cut away from yourself with the rotary cutter, keep your ruler hand clear of the blade path and close the blade guard every time you put the cutter down (see the cutter\'s instructions).',
    });
  }
  if (/\b(press|pressing|pressed|iron|ironing)\b/.test(all)) {
    cautions.push({
      kind: 'iron',
      text: 'When pressing, set the iron upright or on its rest between uses, keep the cord out of the way and follow the iron\'s manual for heat settings; synthetic batting can melt under a hot iron.',
    });
  }
  return cautions;
}
