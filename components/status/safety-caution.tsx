// Shown wherever the rider will work on springs.
export function SafetyCaution() {
  return (
    <aside
      role="note"
      aria-label="Safety"
      className="rounded-xl border-2 border-amber-500 bg-amber-soft p-4 text-stone-900"
    >
      <h3 className="font-bold">⚠ Before you touch springs</h3>
      <ul className="mt-2 list-disc space-y-1 pl-5">
        <li>
          Compressed springs and gas-charged shocks store energy and can release it violently. Never open a shock or a
          fork cap under pressure.
        </li>
        <li>
          Follow the manufacturer&apos;s service manual and local rules, or have a qualified suspension technician do
          the work.
        </li>
        <li>Support the bike securely on a stand before measuring or adjusting.</li>
        <li>Before riding, re-check sag and the tightness of every fastener you touched.</li>
      </ul>
    </aside>
  );
}
