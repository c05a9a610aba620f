// The cautions every shop printout carries (the project's safety notes, kept general: they do not
// replace training, the makers' instructions or licensed practice).
export const PRINTOUT_CAUTIONS: ReadonlyArray<{ title: string; text: string }> = [
  {
    title: "Check the template before cutting",
    text: "Print at 100% (actual size), never 'fit to page'. Measure the 100 mm and 4 in rulers on every page; if either is off, do not cut to that print.",
  },
  {
    title: "Saws and power tools",
    text: "Keep guards in place and follow each tool's instructions; clamp the work; wear eye and hearing protection; use dust extraction and a respirator for wood dust and finishes.",
  },
  {
    title: "Strings under tension",
    text: "Strings can snap while being brought to pitch or pull-tested: wear eye protection, keep your face out of line with the string and tune up gradually.",
  },
  {
    title: "Amplifiers, mains power and pickup wiring",
    text: "Amplifiers hold lethal voltages, even unplugged. Keep protective earths intact. For mains-powered equipment and pickup wiring, follow local electrical codes and licensed practice; leave mains-side work to qualified people.",
  },
];
