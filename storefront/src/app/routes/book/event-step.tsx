import { Button } from '@chakra-ui/react';
import { isIsoDate } from '@nappe/shared';
import { useCallback, useState } from 'react';
import { Link as RouterLink, useNavigate, useSearchParams } from 'react-router';
import { paths } from '../../../config/paths';
import { EventStepForm } from '../../../features/booking/components/event-step-form';
import type { EventDraft } from '../../../features/booking/draft/booking-draft';
import { useBooking } from './book-layout';

/** *Your event*: date, service time, venue, occasion, phone. */
export function EventStepRoute() {
  const { menu, draft, update } = useBooking();
  const navigate = useNavigate();
  const [searchParams] = useSearchParams();
  // A date chosen on Dates arrives in the address; a date already in the draft wins.
  const [defaults] = useState<EventDraft>(() => {
    const fromDates = searchParams.get('date');
    return {
      ...draft.event,
      eventDate: draft.event.eventDate || (isIsoDate(fromDates) ? fromDates : ''),
    };
  });

  const save = useCallback(
    (event: EventDraft, quiet = true) => update((d) => ({ ...d, event }), { quiet }),
    [update],
  );

  return (
    <EventStepForm
      menuId={menu.id}
      defaultValues={defaults}
      onChange={save}
      onSubmit={(event) => {
        save(event, false);
        void navigate(paths.book.getHref(menu.id, 'guests'));
      }}
      back={
        <Button asChild variant="ghost">
          <RouterLink to={paths.menu.getHref(menu.id)}>Back to the menu</RouterLink>
        </Button>
      }
    />
  );
}
