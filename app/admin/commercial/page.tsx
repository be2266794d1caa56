import { requirePageUser } from '@/lib/auth/guard';
import { getCommercialSettings } from '@/lib/settings/commercial-queries';
import { basisPointsToPercent } from '@/lib/quotes/decimal-input';
import { decimalText } from '@/lib/quotes/money';
import { CommercialSettingsForm } from './commercial-settings-form';

export const metadata = { title: 'Quoting settings' };

export default async function CommercialSettingsPage() {
  await requirePageUser('settings.manage');
  const { settings: s, version } = await getCommercialSettings();
  return (
    <>
      <h1>Quoting settings</h1>
      <p className="muted">New estimates start from these figures; a quote already sent keeps the figures and terms it was sent with.</p>
      <section className="card">
        <CommercialSettingsForm
          defaults={{
            version,
            currency: s.currency,
            taxMode: s.taxMode,
            defaultTaxRate: basisPointsToPercent(s.defaultTaxRateBp),
            labourRate: decimalText(s.labourRateMinor, s.currency),
            copperPricePerKg: decimalText(s.copperPricePerKgMinor, s.currency),
            copperAllowance: basisPointsToPercent(s.copperAllowanceBp),
            insulationAllowance: basisPointsToPercent(s.insulationAllowanceBp),
            varnishAllowance: basisPointsToPercent(s.varnishAllowanceBp),
            quoteValidityDays: s.quoteValidityDays,
            quoteTerms: s.quoteTerms,
            warrantyDays: s.warrantyDays,
          }}
        />
      </section>
    </>
  );
}
