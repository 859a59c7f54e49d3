/** A three-section document whose sections share no content words: focus tests pick by topic (invented, demo-style data). */
export const HARBOUR_DOCUMENT = [
  '# Harbour plan',
  '',
  '## Ferries',
  '',
  'The night ferry leaves the harbour at ten. Tickets for the night ferry are sold on board. The ferry carries two hundred riders.',
  '',
  '## Cafe',
  '',
  'The harbour cafe opens at six. Cafe prices rose last spring. The cafe sells soup and bread.',
  '',
  '## Parking',
  '',
  'Parking near the pier costs two coins an hour. The car park closes at midnight. Parking wardens patrol at night.',
  '',
].join('\n');
