import { ALERT_DELIVERIES, ALERT_DELIVERY_LABELS, type AlertDelivery } from '@understudy/shared-types';
import { useState, type FormEvent } from 'react';
import { Link } from 'react-router';
import { Alert, Button, Card, ErrorState, LoadingState, PageHeader, SectionHeading, buttonClasses } from '../../../components/ui';
import { useAlertPreferences } from '../api/get-alert-preferences';
import { useUpdateAlertPreferences } from '../api/update-alert-preferences';

const DELIVERY_HINTS: Record<AlertDelivery, string> = {
  immediate: 'One e-mail per change, as it happens.',
  daily: 'Every change of the day in one e-mail, each morning.',
  off: 'Nothing by e-mail; the notices still collect under the bell.',
};

function DeliveryForm({ current }: { current: AlertDelivery }) {
  const save = useUpdateAlertPreferences();
  const [delivery, setDelivery] = useState<AlertDelivery>(current);

  function submit(event: FormEvent) {
    event.preventDefault();
    save.mutate({ delivery });
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-4 p-5">
      <fieldset className="flex flex-col gap-2">
        <legend className="mb-1 text-sm font-semibold text-ink">When a part on a BOM you watch changes</legend>
        {ALERT_DELIVERIES.map((d) => (
          <label key={d} className="flex cursor-pointer items-start gap-3 rounded-md border border-rule bg-card px-4 py-3 has-checked:border-copper has-checked:bg-copper-wash/40">
            <input
              type="radio"
              name="delivery"
              value={d}
              checked={delivery === d}
              onChange={() => {
                setDelivery(d);
                save.reset();
              }}
              className="mt-0.5 size-4 accent-copper"
            />
            <span className="flex flex-col">
              <span className="font-semibold text-ink">{ALERT_DELIVERY_LABELS[d]}</span>
              <span className="text-sm text-ink-soft">{DELIVERY_HINTS[d]}</span>
            </span>
          </label>
        ))}
      </fieldset>
      {save.isSuccess && (
        <Alert tone="success" title="Saved">
          {ALERT_DELIVERY_LABELS[save.data.delivery]}.
        </Alert>
      )}
      {save.isError && <Alert tone="error" title="Not saved">{save.error.message}</Alert>}
      <div>
        <Button type="submit" loading={save.isPending} disabled={delivery === current && !save.isError}>
          Save
        </Button>
      </div>
    </form>
  );
}

/** How the person hears about changes to parts on their watched BOMs. */
export function AlertSettings() {
  const preferences = useAlertPreferences();
  return (
    <div className="flex flex-col gap-5">
      <PageHeader
        title="Alert settings"
        description="Only BOMs you own and watch send alerts; colleagues a BOM is shared with are not alerted."
        actions={
          <Link to="/notices" className={buttonClasses('secondary')}>
            Notices
          </Link>
        }
      />
      <Card aria-labelledby="alert-delivery-title" className="max-w-2xl">
        <SectionHeading id="alert-delivery-title">E-mail</SectionHeading>
        {preferences.isPending ? (
          <LoadingState label="Loading your settings…" />
        ) : preferences.isError ? (
          <div className="p-5">
            <ErrorState message={preferences.error.message} onRetry={() => void preferences.refetch()} />
          </div>
        ) : (
          <DeliveryForm current={preferences.data.delivery} />
        )}
      </Card>
    </div>
  );
}
