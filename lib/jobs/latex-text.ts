/**
 * LaTeX of our calculator steps → readable plain text for the PDF bench sheet, e.g.
 * `R_k = \frac{V_\text{bias}}{I_k}` → `R_k = V_bias / I_k`. Covers the subset our steps use.
 */

const SYMBOLS: Record<string, string> = {
  cdot: "·",
  times: "×",
  pm: "±",
  le: "≤",
  leq: "≤",
  ge: "≥",
  geq: "≥",
  approx: "≈",
  ne: "≠",
  neq: "≠",
  parallel: "∥",
  to: "→",
  rightarrow: "→",
  Rightarrow: "⇒",
  infty: "∞",
  ldots: "…",
  dots: "…",
  cdots: "…",
  mu: "µ",
  Omega: "Ω",
  omega: "ω",
  tau: "τ",
  pi: "π",
  alpha: "α",
  beta: "β",
  gamma: "γ",
  delta: "δ",
  Delta: "Δ",
  rho: "ρ",
  theta: "θ",
  phi: "φ",
  varphi: "φ",
  epsilon: "ε",
  varepsilon: "ε",
  lambda: "λ",
  sigma: "σ",
  Sigma: "Σ",
  sum: "Σ",
  ln: "ln",
  log: "log",
  exp: "exp",
  sin: "sin",
  cos: "cos",
  tan: "tan",
  max: "max",
  min: "min",
  quad: " ",
  qquad: " ",
  ",": " ",
  ";": " ",
  ":": " ",
  "!": "",
  " ": " ",
  "%": "%",
  "{": "{",
  "}": "}",
  _: "_",
  "#": "#",
  "&": "&",
  left: "",
  right: "",
  big: "",
  Big: "",
  bigl: "",
  bigr: "",
  displaystyle: "",
  "\\": " ",
  sgn: "sgn",
  operatorname: "",
};

const FUNCTIONS = new Set(["ln", "log", "exp", "sin", "cos", "tan"]);

const TEXT_COMMANDS = new Set(["text", "mathrm", "textrm", "mathit", "mathbf", "textbf", "operatorname", "mathsf", "boldsymbol"]);

class Reader {
  i = 0;
  constructor(readonly s: string) {}
  peek() {
    return this.s[this.i];
  }
  done() {
    return this.i >= this.s.length;
  }
}

/** One argument: a {group} or a single character / command. */
function readArg(r: Reader): string {
  while (r.peek() === " ") r.i++;
  if (r.peek() === "{") {
    r.i++;
    const out = readUntil(r, "}");
    r.i++;
    return out;
  }
  if (r.peek() === "\\") return readCommand(r);
  const c = r.peek() ?? "";
  r.i++;
  return c;
}

const wrap = (t: string) => (/^[\w.µΩ]+$/u.test(t.trim()) ? t.trim() : `(${t.trim()})`);

function readCommand(r: Reader): string {
  r.i++; // backslash
  let name = "";
  if (/[a-zA-Z]/.test(r.peek() ?? "")) {
    while (!r.done() && /[a-zA-Z]/.test(r.peek()!)) name += r.s[r.i++];
  } else {
    name = r.s[r.i++] ?? "";
  }
  if (name === "frac" || name === "dfrac" || name === "tfrac") {
    const a = readArg(r);
    const b = readArg(r);
    return `${wrap(a)} / ${wrap(b)}`;
  }
  if (name === "sqrt") return `√${wrap(readArg(r))}`;
  if (FUNCTIONS.has(name)) {
    while (r.peek() === " " || r.s.startsWith("\\!", r.i) || r.s.startsWith("\\,", r.i)) r.i += r.peek() === " " ? 1 : 2;
    if (r.s.startsWith("\\frac", r.i) || r.s.startsWith("\\dfrac", r.i)) return `${name}(${readCommand(r)})`;
    return `${name} `;
  }
  if (TEXT_COMMANDS.has(name)) return readArg(r);
  if (name in SYMBOLS) return SYMBOLS[name];
  return name;
}

const SUPERSCRIPTS: Record<string, string> = { "2": "²", "3": "³" };

function readUntil(r: Reader, stop?: string): string {
  let out = "";
  while (!r.done() && r.peek() !== stop) {
    const c = r.peek()!;
    if (c === "\\") out += readCommand(r);
    else if (c === "{") {
      r.i++;
      out += readUntil(r, "}");
      r.i++;
    } else if (c === "_") {
      r.i++;
      out += `_${readArg(r).trim()}`;
    } else if (c === "^") {
      r.i++;
      const sup = readArg(r).trim();
      out += SUPERSCRIPTS[sup] ?? `^${wrap(sup)}`;
    } else if (c === "~") {
      r.i++;
      out += " ";
    } else {
      out += c;
      r.i++;
    }
  }
  return out;
}

export function latexToText(latex: string): string {
  return readUntil(new Reader(latex)).replace(/\s+/g, " ").replace(/\(\s+/g, "(").replace(/\s+\)/g, ")").trim();
}

/**
 * The PDF's fonts (server/pdf/fonts.ts) cover Latin, µ, Ω and the Greek letters, but not the math
 * symbols: those few are written out. Ω and µ stay as they are (never "kohm"), and so do τ, π, ω.
 */
const PDF_REPLACEMENTS: [RegExp, string][] = [
  [/\u2126/g, "Ω"],
  [/μ/g, "µ"],
  [/√/g, "sqrt"],
  [/≤/g, "<="],
  [/≥/g, ">="],
  [/≠/g, "!="],
  [/≈/g, "~"],
  [/⇒/g, "=>"],
  [/→/g, "->"],
  [/∞/g, "infinity"],
  [/∥/g, "||"],
];

export function pdfText(text: string): string {
  return PDF_REPLACEMENTS.reduce((t, [re, to]) => t.replace(re, /^[a-z]{2,}$/i.test(to) ? ` ${to} ` : to), text)
    .replace(/ {2,}/g, " ")
    .replace(/\( /g, "(")
    .replace(/ \)/g, ")")
    .trim();
}
