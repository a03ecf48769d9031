// Writes shortest-reference.csv: 64-bit patterns of doubles and the string ECMAScript's Number::toString gives
// for them (ECMA-262, Number::toString: the shortest decimal that rounds back, nearest of those, layout rules).
// Run with: node shortest-reference.js > shortest-reference.csv   (node v18 was used)
const buf = new DataView(new ArrayBuffer(8));
let state = 0x2545F4914F6CDD1Dn; // xorshift64* with a fixed seed
function next() {
  state ^= state >> 12n; state ^= (state << 25n) & 0xFFFFFFFFFFFFFFFFn; state ^= state >> 27n;
  return (state * 0x2545F4914F6CDD1Dn) & 0xFFFFFFFFFFFFFFFFn;
}
const out = ["bits,ecmascript"];
function emit(bits) {
  buf.setBigUint64(0, bits);
  const d = buf.getFloat64(0);
  if (!Number.isFinite(d) || d === 0) return;
  out.push(bits.toString(16).padStart(16, "0") + "," + String(d));
}
const specials = [5e-324, 1e-323, 2.2250738585072014e-308, 2.225073858507201e-308, 1.7976931348623157e308,
  0.1, 0.2, 0.3, 1 / 3, 2 / 3, 1e21, 1e-7, 1e-6, 123456789012345680000, 9007199254740993, 2.82879384806159e17,
  1.18575755e-316, 1e23, 5e-310, 4.35e-322, 2 ** -1022, 2 ** 1023, 0.000001, 1e-5, 100, 1.5];
for (const s of specials) { buf.setFloat64(0, s); emit(buf.getBigUint64(0)); }
for (let i = 0; i < 3000; i++) emit(next());                          // all exponents, mostly huge and tiny
for (let i = 0; i < 3000; i++) {                                       // exponents of probabilities, [2^-60, 2)
  const r = next();
  const exp = 0x3C3n + (r >> 52n) % 61n;
  emit((exp << 52n) | (r & 0xFFFFFFFFFFFFFn));
}
for (let i = 0; i < 500; i++) emit(next() & 0xFFFFFFFFFFFFFn);         // subnormals
for (let e = 1n; e < 2047n; e += 1n) emit(e << 52n);                   // powers of two (uneven gaps)
console.log(out.join("\n"));
