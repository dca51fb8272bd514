export {};

// `npm run bench`: every benchmark in turn. Each prints its figures as ratios to a baseline measured
// in the same run, because these machines are shared and absolute timings drift.
const benches = ["./sizing", "./queue", "./sheet", "./http", "./pages"];

for (const bench of benches) {
  console.log(`\n# ${bench.slice(2)}`);
  await import(bench);
}
