/**
 * The invented demo shop: people, customers and motors made up for the demo only. Nameplates are
 * believable (several voltages, 50 and 60 Hz, 2 to 8 poles) but describe no real machine.
 */
export const DEMO_SHOP_NAME = 'Harrow Vale Motor Rewinds';

export const DEMO_USERS = [
  { name: 'Dana Whitlock', email: 'desk@demo.coilwright', role: 'FRONT_DESK', password: 'desk-demo-2026' },
  { name: 'Priya Okafor', email: 'desk2@demo.coilwright', role: 'FRONT_DESK', password: 'desk-demo-2026' },
  { name: 'Tomasz Brennan', email: 'winder@demo.coilwright', role: 'WINDER', password: 'winder-demo-2026' },
  { name: 'Lucía Fenwick', email: 'winder2@demo.coilwright', role: 'WINDER', password: 'winder-demo-2026' },
  { name: 'Ravi Castellano', email: 'engineer@demo.coilwright', role: 'ENGINEER', password: 'engineer-demo-2026' },
  { name: 'Ingrid Sato', email: 'engineer2@demo.coilwright', role: 'ENGINEER', password: 'engineer-demo-2026' },
  { name: 'Morgan Achterberg', email: 'admin@demo.coilwright', role: 'ADMIN', password: 'admin-demo-2026' },
] as const;

export const DEMO_CUSTOMERS = [
  { company: 'Brackenridge Aggregates', contact: 'Owen Faulds', phone: '+1 555 0142', email: 'maintenance@brackenridge.example' },
  { company: 'Lowmoor Water Board', contact: 'Hettie Lamb', phone: '+44 1632 960 118', email: 'pumps@lowmoor.example' },
  { company: 'Quillon Paper Mill', contact: 'Ansel Vries', phone: '+1 555 0177', email: 'reliability@quillon.example' },
  { company: 'Tarnbeck Cold Storage', contact: 'Mei Ardent', phone: '+44 1632 960 402', email: 'ops@tarnbeck.example' },
  { company: 'Ostrava Lane Bakery', contact: 'Felix Horvath', phone: '+1 555 0109', email: 'felix@ostravalane.example' },
  { company: 'Kestrel Ridge Mining', contact: 'Joanna Pike', phone: '+61 2 5550 1930', email: 'electrical@kestrelridge.example' },
  { company: 'Marrowgate Plastics', contact: 'Samir Quint', phone: '+1 555 0163', email: 'samir@marrowgate.example' },
  { company: 'Feldmere Dairy Co-op', contact: 'Ruth Ellery', phone: '+44 1632 960 771', email: 'plant@feldmere.example' },
  { company: 'Cinderford Sawmills', contact: 'Abel Tranter', phone: '+1 555 0128', email: 'abel@cinderford.example' },
  { company: 'Port Ilsley Marine Services', contact: 'Nadia Corran', phone: '+44 1632 960 559', email: 'workshop@portilsley.example' },
] as const;

export const DEMO_MANUFACTURERS = [
  'Aldwick Electric',
  'Brunel & Rook',
  'Corvina Motors',
  'Deverell Drives',
  'Elmstead Machines',
  'Fairholm Power',
] as const;

/** [output kW, line V, Hz, poles, rated rpm, connection, frame] */
export const DEMO_RATINGS: [number, number, number, number, number, string, string][] = [
  [0.75, 400, 50, 4, 1400, 'star', '80'],
  [1.5, 400, 50, 2, 2860, 'star', '90S'],
  [2.2, 230, 60, 4, 1740, 'delta', '100L'],
  [3.7, 460, 60, 4, 1750, 'star', '112M'],
  [5.5, 400, 50, 6, 960, 'delta', '132M'],
  [7.5, 460, 60, 2, 3520, 'delta', '132S'],
  [11, 400, 50, 4, 1460, 'delta', '160M'],
  [15, 690, 50, 4, 1465, 'star', '160L'],
  [18.5, 575, 60, 6, 1175, 'delta', '180L'],
  [22, 400, 50, 8, 730, 'delta', '200L'],
  [30, 460, 60, 4, 1775, 'delta', '200L'],
  [37, 380, 50, 2, 2955, 'delta', '200L'],
  [45, 415, 50, 6, 985, 'delta', '250M'],
  [55, 400, 50, 4, 1480, 'delta', '250M'],
  [4, 220, 60, 8, 860, 'delta', '132M'],
];

export const DEMO_FAULTS = [
  'Tripped on overload, smells burnt; one phase reads open.',
  'Earth fault on start-up; insulation resistance low in the field.',
  'Runs hot and noisy; drive-end bearing rumbling.',
  'Flooded in pit; needs clean, dry and test.',
  'Customer wants it rewound for 60 Hz supply.',
  'Single-phased under load; stator discoloured on one phase.',
  'Seized shaft after long storage.',
  'Vibration high at 2× line frequency.',
  'Needs conversion from 400 V to 690 V for new plant supply.',
  'Nuisance tripping; winding resistance unbalanced.',
];
