/**
 * Who may call what: the policy written out by hand from DESIGN.md (clients book and see their
 * own events; the chef runs the studio; staff read the kitchen and prep and see allergy notes;
 * the public sees menus, dates and the studio card). QUALITY.md asks for a 401/403 matrix of
 * every route and role (OWASP API Security Top 10 2023, API1 object level and API5 function level
 * authorisation; ASVS 4.0.3 V4.1.3 least privilege, V4.2.1 direct object references).
 *
 * `public` routes answer without a token. Every other route answers 401 without one, 403 to a
 * role not listed, and neither 401 nor 403 to a role listed. A new route fails the first test
 * until someone decides here who may call it.
 */
export type Caller = 'client' | 'staff' | 'chef';
export const ANY: Caller[] = ['client', 'staff', 'chef'];
const TEAM: Caller[] = ['staff', 'chef'];
const CHEF: Caller[] = ['chef'];
const CLIENT: Caller[] = ['client'];

export const POLICY: Record<string, 'public' | Caller[]> = {
  // Accounts and sessions.
  'POST /api/auth/register': 'public',
  'POST /api/auth/login': 'public',
  'POST /api/auth/refresh': 'public',
  'POST /api/auth/logout': 'public',
  'POST /api/auth/accept-invitation': 'public',
  'POST /api/auth/password-reset': 'public',
  'POST /api/auth/password-reset/confirm': 'public',
  'GET /api/auth/me': ANY,
  // A client's own data (GDPR Art. 15, 17, 20).
  'GET /api/me/export': CLIENT,
  'DELETE /api/me': CLIENT,
  // The storefront's public pages.
  'GET /api/health': 'public',
  'GET /api/health/ready': 'public',
  'GET /api/health/live': 'public',
  'GET /api/studio': 'public',
  'GET /api/menus': 'public',
  'GET /api/menus/:id': 'public',
  'GET /api/booking-terms': 'public',
  'GET /api/availability': 'public',
  'POST /api/quotes': 'public',
  'GET /api/files/:name': 'public',
  // Signed by the payment service, not by a session.
  'POST /api/payments/webhook': 'public',
  // Kitchen: the chef writes; staff read (costs stripped by the services).
  'GET /api/ingredients': TEAM,
  'GET /api/ingredients/:id': TEAM,
  'POST /api/ingredients': CHEF,
  'PUT /api/ingredients/:id': CHEF,
  'DELETE /api/ingredients/:id': CHEF,
  'GET /api/recipes': TEAM,
  'GET /api/recipes/:id': TEAM,
  'GET /api/recipes/:id/scaled': TEAM,
  'GET /api/recipes/:id/allergens': TEAM,
  'GET /api/recipes/:id/cost': CHEF,
  'GET /api/recipes/:id/mix-balance': TEAM,
  'POST /api/recipes': CHEF,
  'PUT /api/recipes/:id': CHEF,
  'DELETE /api/recipes/:id': CHEF,
  'GET /api/desserts': TEAM,
  'GET /api/desserts/:id': TEAM,
  'GET /api/desserts/:id/allergens': TEAM,
  'GET /api/desserts/:id/summary': CHEF, // with plate costs
  'POST /api/desserts': CHEF,
  'PUT /api/desserts/:id': CHEF,
  'DELETE /api/desserts/:id': CHEF,
  'POST /api/desserts/:id/photo': CHEF,
  'DELETE /api/desserts/:id/photo/:photoId': CHEF,
  'GET /api/menus/admin': TEAM,
  'GET /api/menus/admin/:id': TEAM,
  'GET /api/menus/:id/costing': CHEF,
  'POST /api/menus': CHEF,
  'PUT /api/menus/:id': CHEF,
  'DELETE /api/menus/:id': CHEF,
  'POST /api/menus/:id/photo': CHEF,
  'DELETE /api/menus/:id/photo/:photoId': CHEF,
  // Orders: clients their own (others' → 404, below); the chef decides.
  'POST /api/orders': CLIENT,
  'GET /api/orders': ANY,
  'GET /api/orders/:id': ANY,
  'POST /api/orders/:id/checkout': CLIENT,
  'POST /api/orders/:id/checkout/return': CLIENT,
  'POST /api/orders/:id/cancellation-preview': ['client', 'chef'],
  'POST /api/orders/:id/cancel': ['client', 'chef'],
  'POST /api/orders/:id/guest-change-preview': ['client', 'chef'],
  'PUT /api/orders/:id/guests': ['client', 'chef'],
  'POST /api/orders/:id/confirm': CHEF,
  'POST /api/orders/:id/decline': CHEF,
  'POST /api/orders/:id/complete': CHEF,
  'GET /api/orders/:id/receipts/:paymentId.pdf': ['client', 'chef'],
  'GET /api/orders/:id/event.ics': ANY,
  // Allergy notes: the client of the event (theirs only), its chef and staff; substitutions
  // are the chef's.
  'GET /api/allergy-notes/counts': TEAM,
  'GET /api/orders/:id/allergy-notes': ANY,
  'PUT /api/orders/:id/guests/:guestId/substitutions/:dessertId': CHEF,
  'DELETE /api/orders/:id/guests/:guestId/substitutions/:dessertId': CHEF,
  'GET /api/orders/:id/briefing': TEAM,
  'GET /api/orders/:id/briefing.pdf': TEAM,
  'GET /api/orders/:id/access-log': CHEF,
  // Prep: the whole team.
  'GET /api/prep/plan': TEAM,
  'GET /api/prep/plan.csv': TEAM,
  'GET /api/prep/plan.pdf': TEAM,
  'GET /api/prep/schedule': TEAM,
  'POST /api/prep/tasks/:taskKey/done': TEAM,
  'DELETE /api/prep/tasks/:taskKey/done': TEAM,
  'GET /api/prep/labels.pdf': TEAM,
  // The studio: the chef's.
  'GET /api/studio/settings': CHEF,
  'PUT /api/studio/settings': CHEF,
  'POST /api/studio/invitations': CHEF,
  'GET /api/studio/invitations': CHEF,
  'DELETE /api/studio/invitations/:id': CHEF,
  'GET /api/users': CHEF,
  'PATCH /api/users/:id/role': CHEF,
  'DELETE /api/users/:id': CHEF,
  'GET /api/insights/dashboard': CHEF,
};
