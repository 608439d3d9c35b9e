/**
 * A quote of the signed-in member's own truck (the API marks it `forMyself`): there is no customer to send it to (the API
 * refuses), so the places that send say why in place of the button.
 */
export const OWN_TRUCK_QUOTE_NOTE = 'Your own truck: no customer to send this quote to. Keep it as the budget of your build.';
