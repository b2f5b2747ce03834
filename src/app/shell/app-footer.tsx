export function AppFooter() {
  return (
    <footer className="mt-auto border-t border-line bg-oat-100">
      <div className="mx-auto flex max-w-shell flex-col gap-3 px-gutter py-8 text-sm leading-relaxed text-ink-soft">
        <p className="max-w-measure">
          <strong className="text-ink">Estimates, not medical advice.</strong> Hearthswap works out estimates from typical food values. If you live with kidney
          disease, diabetes, pregnancy, an eating disorder or food allergies, follow your physician or a registered dietitian rather than these numbers.
        </p>
        <p className="max-w-measure">
          Coaching on Hearthswap is not a substitute for licensed practice, and local codes govern food sold to the public. Nutrient values come from the USDA
          National Nutrient Database for Standard Reference.
        </p>
        <p className="font-bold text-oat-800">Hearthswap · lighter plates, same portions</p>
      </div>
    </footer>
  );
}
