// The units a quantity can be written in: each with its SI factor, its dimension and the prefixes it takes.
// The set, the factors, the prefix sets and the order are those of mathjs 15.2.0 (lib/esm/type/unit/Unit.js,
// the package the lockfile pins) for every unit built from mass, length, time, temperature and angle, so a
// value reads the same as it did when mathjs read it; test/project/unitReader_test.ts checks them against it.
// mathjs's other units (electric, luminous, amount, information) are listed too, so that they read as a unit of
// another dimension, not as an unknown name.
// Definitions: the international inch, foot, yard and pound (1959), the International Table Btu
// (1055.05585262 J), the Julian year (365.25 d) for year and month.

/** Exponents of mass, length, time, temperature and angle. */
export type Dimension = readonly [number, number, number, number, number];

const MASS: Dimension = [1, 0, 0, 0, 0];
const LENGTH: Dimension = [0, 1, 0, 0, 0];
const TIME: Dimension = [0, 0, 1, 0, 0];
const TEMPERATURE: Dimension = [0, 0, 0, 1, 0];
const ANGLE: Dimension = [0, 0, 0, 0, 1];
const AREA: Dimension = [0, 2, 0, 0, 0];
const VOLUME: Dimension = [0, 3, 0, 0, 0];
const FREQUENCY: Dimension = [0, 0, -1, 0, 0];
const FORCE: Dimension = [1, 1, -2, 0, 0];
const ENERGY: Dimension = [1, 2, -2, 0, 0];
const POWER: Dimension = [1, 2, -3, 0, 0];
const PRESSURE: Dimension = [1, -1, -2, 0, 0];
/** Electric, luminous, amount-of-substance and information units: known, so that they read as a wrong kind. */
const OTHER: Dimension = [NaN, NaN, NaN, NaN, NaN];

/** Which prefixes a unit takes: none, the symbols (k, m, ...), the names (kilo, milli, ...), or both. */
type PrefixSet =
  | "none"
  | "short"
  | "long"
  | "squared"
  | "cubic"
  | "shortLong"
  | "btu"
  | "binaryShort"
  | "binaryLong";

/** One unit: its SI factor, dimension and prefixes; an offset (in kelvin, as a fraction) for a temperature scale. */
export interface UnitEntry {
  readonly name: string;
  readonly factor: number;
  readonly dimension: Dimension;
  readonly prefixes: PrefixSet;
  /** Where the scale's zero lies, in kelvin: numerator and denominator (degC 5463/20 = 273.15). */
  readonly offset?: readonly [number, number];
}

type Row = readonly [string, number, Dimension, PrefixSet, (readonly [number, number])?];

const DEG = Math.PI / 180;
const GRAD = Math.PI / 200;
const RANKINE = 5 / 9;
const CELSIUS_ZERO = [5463, 20] as const; // 273.15 K
const FAHRENHEIT_ZERO = [45967, 180] as const; // 459.67 degR = 459.67 * 5/9 K

// deno-fmt-ignore
const ROWS: readonly Row[] = [
  ["meter", 1, LENGTH, "long"], ["inch", 0.0254, LENGTH, "none"], ["foot", 0.3048, LENGTH, "none"],
  ["yard", 0.9144, LENGTH, "none"], ["mile", 1609.344, LENGTH, "none"], ["link", 0.201168, LENGTH, "none"],
  ["rod", 5.0292, LENGTH, "none"], ["chain", 20.1168, LENGTH, "none"], ["angstrom", 1e-10, LENGTH, "none"],
  ["m", 1, LENGTH, "short"], ["in", 0.0254, LENGTH, "none"], ["ft", 0.3048, LENGTH, "none"],
  ["yd", 0.9144, LENGTH, "none"], ["mi", 1609.344, LENGTH, "none"], ["li", 0.201168, LENGTH, "none"],
  ["rd", 5.02921, LENGTH, "none"], ["ch", 20.1168, LENGTH, "none"], ["mil", 0.0000254, LENGTH, "none"],
  ["m2", 1, AREA, "squared"], ["sqin", 0.00064516, AREA, "none"], ["sqft", 0.09290304, AREA, "none"],
  ["sqyd", 0.83612736, AREA, "none"], ["sqmi", 2589988.110336, AREA, "none"], ["sqrd", 25.29295, AREA, "none"],
  ["sqch", 404.6873, AREA, "none"], ["sqmil", 6.4516e-10, AREA, "none"], ["acre", 4046.86, AREA, "none"],
  ["hectare", 10000, AREA, "none"], ["m3", 1, VOLUME, "cubic"], ["L", 0.001, VOLUME, "short"],
  ["l", 0.001, VOLUME, "short"], ["litre", 0.001, VOLUME, "long"], ["cuin", 0.000016387064, VOLUME, "none"],
  ["cuft", 0.028316846592, VOLUME, "none"], ["cuyd", 0.764554857984, VOLUME, "none"],
  ["teaspoon", 0.000005, VOLUME, "none"], ["tablespoon", 0.000015, VOLUME, "none"], ["drop", 5e-8, VOLUME, "none"],
  ["gtt", 5e-8, VOLUME, "none"], ["minim", 6.1611519921875e-8, VOLUME, "none"],
  ["fluiddram", 0.0000036966911953125, VOLUME, "none"], ["fluidounce", 0.0000295735295625, VOLUME, "none"],
  ["gill", 0.00011829411825, VOLUME, "none"], ["cc", 0.000001, VOLUME, "none"], ["cup", 0.0002365882365, VOLUME, "none"],
  ["pint", 0.000473176473, VOLUME, "none"], ["quart", 0.000946352946, VOLUME, "none"],
  ["gallon", 0.003785411784, VOLUME, "none"], ["beerbarrel", 0.117347765304, VOLUME, "none"],
  ["oilbarrel", 0.158987294928, VOLUME, "none"], ["hogshead", 0.238480942392, VOLUME, "none"],
  ["g", 0.001, MASS, "short"], ["gram", 0.001, MASS, "long"], ["ton", 907.18474, MASS, "short"],
  ["t", 1000, MASS, "short"], ["tonne", 1000, MASS, "long"], ["grain", 0.00006479891, MASS, "none"],
  ["dram", 0.0017718451953125, MASS, "none"], ["ounce", 0.028349523125, MASS, "none"],
  ["poundmass", 0.45359237, MASS, "none"], ["hundredweight", 45.359237, MASS, "none"], ["stick", 0.115, MASS, "none"],
  ["stone", 6.35029318, MASS, "none"], ["gr", 0.00006479891, MASS, "none"], ["dr", 0.0017718451953125, MASS, "none"],
  ["oz", 0.028349523125, MASS, "none"], ["lbm", 0.45359237, MASS, "none"], ["cwt", 45.359237, MASS, "none"],
  ["s", 1, TIME, "short"], ["min", 60, TIME, "none"], ["h", 3600, TIME, "none"], ["second", 1, TIME, "long"],
  ["sec", 1, TIME, "long"], ["minute", 60, TIME, "none"], ["hour", 3600, TIME, "none"], ["day", 86400, TIME, "none"],
  ["week", 604800, TIME, "none"], ["month", 2629800, TIME, "none"], ["year", 31557600, TIME, "none"],
  ["decade", 315576000, TIME, "none"], ["century", 3155760000, TIME, "none"],
  ["millennium", 31557600000, TIME, "none"], ["hertz", 1, FREQUENCY, "long"], ["Hz", 1, FREQUENCY, "short"],
  ["rad", 1, ANGLE, "short"], ["radian", 1, ANGLE, "long"], ["deg", DEG, ANGLE, "short"],
  ["degree", DEG, ANGLE, "long"], ["grad", GRAD, ANGLE, "short"], ["gradian", GRAD, ANGLE, "long"],
  ["cycle", Math.PI * 2, ANGLE, "none"], ["arcsec", Math.PI / 648000, ANGLE, "none"],
  ["arcmin", Math.PI / 10800, ANGLE, "none"], ["A", 1, OTHER, "short"], ["ampere", 1, OTHER, "long"],
  ["K", 1, TEMPERATURE, "short"],
  ["degC", 1, TEMPERATURE, "short", CELSIUS_ZERO], ["degF", RANKINE, TEMPERATURE, "short", FAHRENHEIT_ZERO],
  ["degR", RANKINE, TEMPERATURE, "short"], ["kelvin", 1, TEMPERATURE, "long"],
  ["celsius", 1, TEMPERATURE, "long", CELSIUS_ZERO], ["fahrenheit", RANKINE, TEMPERATURE, "long", FAHRENHEIT_ZERO],
  ["rankine", RANKINE, TEMPERATURE, "long"], ["mol", 1, OTHER, "short"], ["mole", 1, OTHER, "long"],
  ["cd", 1, OTHER, "short"], ["candela", 1, OTHER, "long"], ["N", 1, FORCE, "short"], ["newton", 1, FORCE, "long"],
  ["dyn", 0.00001, FORCE, "short"], ["dyne", 0.00001, FORCE, "long"], ["lbf", 4.4482216152605, FORCE, "none"],
  ["poundforce", 4.4482216152605, FORCE, "none"], ["kip", 4448.2216, FORCE, "long"],
  ["kilogramforce", 9.80665, FORCE, "none"], ["J", 1, ENERGY, "short"], ["joule", 1, ENERGY, "long"],
  ["erg", 1e-7, ENERGY, "shortLong"], ["Wh", 3600, ENERGY, "short"], ["BTU", 1055.05585262, ENERGY, "btu"],
  ["eV", 1.602176565e-19, ENERGY, "short"], ["electronvolt", 1.602176565e-19, ENERGY, "long"],
  ["W", 1, POWER, "short"], ["watt", 1, POWER, "long"], ["hp", 745.6998715386, POWER, "none"],
  ["VA", 1, POWER, "short"],
  ["Pa", 1, PRESSURE, "short"], ["psi", 6894.75729276459, PRESSURE, "none"], ["atm", 101325, PRESSURE, "none"],
  ["bar", 100000, PRESSURE, "shortLong"], ["torr", 133.322, PRESSURE, "none"], ["mmHg", 133.322, PRESSURE, "none"],
  ["mmH2O", 9.80665, PRESSURE, "none"], ["cmH2O", 98.0665, PRESSURE, "none"], ["coulomb", 1, OTHER, "long"],
  ["C", 1, OTHER, "short"], ["Ah", 3600, OTHER, "short"], ["farad", 1, OTHER, "long"], ["F", 1, OTHER, "short"],
  ["volt", 1, OTHER, "long"], ["V", 1, OTHER, "short"], ["ohm", 1, OTHER, "shortLong"], ["henry", 1, OTHER, "long"],
  ["H", 1, OTHER, "short"], ["siemens", 1, OTHER, "long"], ["S", 1, OTHER, "short"], ["weber", 1, OTHER, "long"],
  ["Wb", 1, OTHER, "short"], ["tesla", 1, OTHER, "long"], ["T", 1, OTHER, "short"], ["b", 1, OTHER, "binaryShort"],
  ["bits", 1, OTHER, "binaryLong"], ["B", 8, OTHER, "binaryShort"], ["bytes", 8, OTHER, "binaryLong"],
];

/** Other spellings, each taking its unit's factor and prefixes; looked up after every unit above. */
// deno-fmt-ignore
const ALIASES: readonly (readonly [string, string])[] = [
  ["meters", "meter"], ["inches", "inch"], ["feet", "foot"], ["yards", "yard"], ["miles", "mile"],
  ["links", "link"], ["rods", "rod"], ["chains", "chain"], ["angstroms", "angstrom"], ["lt", "l"],
  ["litres", "litre"], ["liter", "litre"], ["liters", "litre"], ["teaspoons", "teaspoon"],
  ["tablespoons", "tablespoon"], ["minims", "minim"], ["fldr", "fluiddram"], ["fluiddrams", "fluiddram"],
  ["floz", "fluidounce"], ["fluidounces", "fluidounce"], ["gi", "gill"], ["gills", "gill"], ["cp", "cup"],
  ["cups", "cup"], ["pt", "pint"], ["pints", "pint"], ["qt", "quart"], ["quarts", "quart"], ["gal", "gallon"],
  ["gallons", "gallon"], ["bbl", "beerbarrel"], ["beerbarrels", "beerbarrel"], ["obl", "oilbarrel"],
  ["oilbarrels", "oilbarrel"], ["hogsheads", "hogshead"], ["gtts", "gtt"], ["grams", "gram"], ["tons", "ton"],
  ["tonnes", "tonne"], ["grains", "grain"], ["drams", "dram"], ["ounces", "ounce"], ["poundmasses", "poundmass"],
  ["hundredweights", "hundredweight"], ["sticks", "stick"], ["lb", "lbm"], ["lbs", "lbm"], ["kips", "kip"],
  ["kgf", "kilogramforce"], ["acres", "acre"], ["hectares", "hectare"], ["sqfeet", "sqft"], ["sqyard", "sqyd"],
  ["sqmile", "sqmi"], ["sqmiles", "sqmi"], ["mmhg", "mmHg"], ["mmh2o", "mmH2O"], ["cmh2o", "cmH2O"],
  ["seconds", "second"], ["secs", "second"], ["minutes", "minute"], ["mins", "minute"], ["hours", "hour"],
  ["hr", "hour"], ["hrs", "hour"], ["days", "day"], ["weeks", "week"], ["months", "month"], ["years", "year"],
  ["decades", "decade"], ["centuries", "century"], ["millennia", "millennium"], ["radians", "radian"],
  ["degrees", "degree"], ["gradians", "gradian"], ["cycles", "cycle"], ["arcsecond", "arcsec"],
  ["arcseconds", "arcsec"], ["arcminute", "arcmin"], ["arcminutes", "arcmin"], ["BTUs", "BTU"], ["watts", "watt"],
  ["joules", "joule"], ["amperes", "ampere"], ["amps", "ampere"], ["amp", "ampere"], ["coulombs", "coulomb"],
  ["volts", "volt"], ["ohms", "ohm"], ["farads", "farad"], ["webers", "weber"], ["teslas", "tesla"],
  ["electronvolts", "electronvolt"], ["moles", "mole"], ["bit", "bits"], ["byte", "bytes"],
];

/** SI prefixes: symbol, name, power of ten. */
// deno-fmt-ignore
const SI_PREFIXES: readonly (readonly [string, string, number])[] = [
  ["da", "deca", 1], ["h", "hecto", 2], ["k", "kilo", 3], ["M", "mega", 6], ["G", "giga", 9], ["T", "tera", 12],
  ["P", "peta", 15], ["E", "exa", 18], ["Z", "zetta", 21], ["Y", "yotta", 24], ["R", "ronna", 27],
  ["Q", "quetta", 30], ["d", "deci", -1], ["c", "centi", -2], ["m", "milli", -3], ["u", "micro", -6],
  ["n", "nano", -9], ["p", "pico", -12], ["f", "femto", -15], ["a", "atto", -18], ["z", "zepto", -21],
  ["y", "yocto", -24], ["r", "ronto", -27], ["q", "quecto", -30],
];

// deno-fmt-ignore
const BINARY_PREFIXES: readonly (readonly [string, string, string, string, number])[] = [
  ["k", "kilo", "Ki", "kibi", 1], ["M", "mega", "Mi", "mebi", 2], ["G", "giga", "Gi", "gibi", 3],
  ["T", "tera", "Ti", "tebi", 4], ["P", "peta", "Pi", "pebi", 5], ["E", "exa", "Ei", "exi", 6],
  ["Z", "zetta", "Zi", "zebi", 7], ["Y", "yotta", "Yi", "yobi", 8],
];

/** Prefix factors by set: `10^(n·k)` written as a decimal literal, as mathjs writes them (1e-4, not 1e-2²). */
function prefixTable(set: PrefixSet): ReadonlyMap<string, number> {
  const table = new Map<string, number>([["", 1]]);
  if (set === "btu") return table.set("MM", 1e6);
  if (set === "binaryShort" || set === "binaryLong") {
    const long = set === "binaryLong";
    for (const [si, siName, iec, iecName, n] of BINARY_PREFIXES) {
      table.set(long ? siName : si, Number(`1e${3 * n}`)).set(long ? iecName : iec, 1024 ** n);
    }
    return table;
  }
  if (set === "none") return table;
  const power = set === "squared" ? 2 : set === "cubic" ? 3 : 1;
  for (const [symbol, name, exponent] of SI_PREFIXES) {
    const factor = Number(`1e${exponent * power}`);
    if (set !== "long") table.set(symbol, factor);
    if (set === "long" || set === "shortLong") table.set(name, factor);
  }
  return table;
}

const PREFIX_TABLES = new Map<PrefixSet, ReadonlyMap<string, number>>();

/** The prefixes a unit takes, with their factors. */
export function prefixesOf(entry: UnitEntry): ReadonlyMap<string, number> {
  let table = PREFIX_TABLES.get(entry.prefixes);
  if (table === undefined) {
    table = prefixTable(entry.prefixes);
    PREFIX_TABLES.set(entry.prefixes, table);
  }
  return table;
}

function entryOf(row: Row, name = row[0]): UnitEntry {
  const [, factor, dimension, prefixes, offset] = row;
  return offset === undefined
    ? { name, factor, dimension, prefixes }
    : { name, factor, dimension, prefixes, offset };
}

const BY_NAME = new Map<string, Row>(ROWS.map((row) => [row[0], row]));

/** Every unit and spelling, in the order a prefixed name is matched against them (units first, then aliases). */
export const UNITS: readonly UnitEntry[] = [
  ...ROWS.map((row) => entryOf(row)),
  ...ALIASES.map(([alias, target]) => entryOf(BY_NAME.get(target)!, alias)),
];
