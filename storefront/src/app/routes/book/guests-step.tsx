import { Button } from '@chakra-ui/react';
import { useCallback, useMemo, useState } from 'react';
import { Link as RouterLink, Navigate, useNavigate } from 'react-router';
import { ArrowRightIcon } from '../../../components/ui/icons';
import { paths } from '../../../config/paths';
import { useAvailability } from '../../../features/booking/api/get-availability';
import { firstDayOf, lastDayOf, monthOf } from '../../../features/booking/components/month';
import { eventComplete } from '../../../features/booking/draft/event-schema';
import { GuestListForm } from '../../../features/guests/components/guest-list-form';
import {
  toGuestFormValues,
  toGuestRequest,
  type GuestFormValues,
  type GuestLimits,
} from '../../../features/guests/form/guest-form';
import { longDate } from '../../../lib/dates';
import { useBooking } from './book-layout';

/** *Your guests*: how many, and each guest's allergies and diets (typed in or from a CSV file). */
export function GuestsStepRoute() {
  const { menu, draft, update } = useBooking();
  const navigate = useNavigate();
  const [defaults] = useState(() =>
    toGuestFormValues(
      draft.guests && {
        guestCount: draft.guests.guestCount,
        guestRequirements: draft.guests.guestRequirements,
        guestDataConsent: draft.guests.guestDataConsent,
      },
    ),
  );
  const date = draft.event.eventDate;
  const month = date ? monthOf(date) : '';
  const availability = useAvailability(
    menu.id,
    month ? firstDayOf(month) : '',
    month ? lastDayOf(month) : '',
    month !== '',
  );

  // The plates left on the chosen day, as the server last said: a party too large for them is
  // caught here rather than at payment (the server checks again when booking).
  const limits = useMemo<GuestLimits>(() => {
    const day = availability.data?.days.find((d) => d.date === date);
    const perGuest = availability.data?.platesPerGuest ?? menu.desserts.length;
    return {
      minGuests: menu.minGuests,
      maxGuests: menu.maxGuests,
      checkCount: (count) => {
        if (!day) return null;
        if (day.status !== 'open') {
          return `${longDate(date)} can no longer be booked. Go back to Your event to choose another date.`;
        }
        const needed = count * perGuest;
        if (needed <= day.remainingPlates) return null;
        return `Only ${day.remainingPlates} plates are left on ${longDate(date)}; ${count} guests need ${needed}${perGuest > 1 ? ` (${perGuest} desserts each)` : ''}. Choose fewer guests or another date.`;
      },
    };
  }, [availability.data, date, menu]);

  const save = useCallback(
    (values: GuestFormValues, quiet = true) => {
      const request = toGuestRequest(values);
      update(
        (d) => ({
          ...d,
          guests: {
            guestCount: Number.isInteger(values.guestCount) ? values.guestCount : null,
            guestRequirements: request.guestRequirements,
            guestDataConsent: values.guestDataConsent,
          },
        }),
        { quiet },
      );
    },
    [update],
  );

  if (!eventComplete(draft.event)) {
    return <Navigate to={paths.book.getHref(menu.id, 'event')} replace />;
  }

  return (
    <GuestListForm
      defaultValues={defaults}
      limits={limits}
      onChange={save}
      onSubmit={(_request, values) => {
        save(values, false);
        void navigate(paths.book.getHref(menu.id, 'review'));
      }}
      submitLabel={
        <>
          Continue to review <ArrowRightIcon />
        </>
      }
      secondary={
        <Button asChild variant="ghost">
          <RouterLink to={paths.book.getHref(menu.id, 'event')}>Back to your event</RouterLink>
        </Button>
      }
    />
  );
}
