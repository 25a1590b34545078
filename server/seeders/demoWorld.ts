import type { TrackTypeKey } from '../../shared/types/trackTypes';
import type { VehicleClassKey } from '../../shared/types/vehicleClasses';
import type { Role } from '../models/User';

/**
 * The invented demo world. Every maker, kit, track and racer here is made up for Tunefork;
 * none stands for a real company, product, place or person.
 */
export const DEMO_MAKERS = [
  { slug: 'ottervale', name: 'Ottervale Kitworks' },
  { slug: 'cinderfell', name: 'Cinderfell Racing Models' },
  { slug: 'marrowby', name: 'Marrowby Works' },
] as const;

export const DEMO_KITS: Array<{
  slug: string;
  name: string;
  maker: (typeof DEMO_MAKERS)[number]['slug'];
  vehicleClass: VehicleClassKey;
  releasedYear: number;
}> = [
  { slug: 'ottervale-stoat-8n', name: 'Stoat 8N', maker: 'ottervale', vehicleClass: 'buggy-1-8-nitro', releasedYear: 2025 },
  { slug: 'ottervale-stoat-8e', name: 'Stoat 8E', maker: 'ottervale', vehicleClass: 'buggy-1-8-electric', releasedYear: 2026 },
  { slug: 'cinderfell-gantry-t8', name: 'Gantry T8', maker: 'cinderfell', vehicleClass: 'truggy-1-8-nitro', releasedYear: 2024 },
  { slug: 'marrowby-wren-10', name: 'Wren 10', maker: 'marrowby', vehicleClass: 'buggy-1-10-4wd', releasedYear: 2026 },
  { slug: 'marrowby-wren-10-two', name: 'Wren 10 Two', maker: 'marrowby', vehicleClass: 'buggy-1-10-2wd', releasedYear: 2025 },
];

export const DEMO_TRACKS: Array<{ slug: string; name: string; surface: TrackTypeKey; indoor: boolean; notes: string }> = [
  {
    slug: 'old-kiln-indoor',
    name: 'Old Kiln Indoor',
    surface: 'indoor-clay',
    indoor: true,
    notes: 'Watered and rolled clay in a former brickworks shed; grip comes up fast through the day.',
  },
  {
    slug: 'saltmarsh-raceway',
    name: 'Saltmarsh Raceway',
    surface: 'hard-packed',
    indoor: false,
    notes: 'Sun-baked packed dirt with a long straight and a tight infield; gets slick when it dries.',
  },
  {
    slug: 'hollow-pines',
    name: 'Hollow Pines Circuit',
    surface: 'loose-dusty',
    indoor: false,
    notes: 'Sandy topsoil under pines; loose on top all day, deep ruts by the evening.',
  },
  {
    slug: 'brackwater-dunes',
    name: 'Brackwater Dunes',
    surface: 'rough-bumpy',
    indoor: false,
    notes: 'Big jumps, braking bumps and a rhythm section that punishes stiff rear ends.',
  },
];

/**
 * Demo accounts. The passwords are for trying Tunefork locally and are listed in the README;
 * the seeder only ever runs against the embedded development database or when asked to.
 */
export const DEMO_RACERS: Array<{
  handle: string;
  displayName: string;
  role: Role;
  homeTrack: string;
  bio: string;
  email: string;
  password: string;
  classesRaced: VehicleClassKey[];
}> = [
  {
    handle: 'tamsin_q',
    email: 'tamsin@racers.example',
    password: 'kiln-timing-desk-7',
    classesRaced: ['buggy-1-10-4wd', 'buggy-1-8-electric'],
    displayName: 'Tamsin Quarrie',
    role: 'admin',
    homeTrack: 'Old Kiln Indoor',
    bio: 'Runs the club timing desk and keeps Tunefork tidy.',
  },
  {
    handle: 'oskar-velde',
    email: 'oskar@racers.example',
    password: 'saltmarsh-marshal-4',
    classesRaced: ['buggy-1-8-nitro', 'truggy-1-8-nitro'],
    displayName: 'Oskar Velde',
    role: 'moderator',
    homeTrack: 'Saltmarsh Raceway',
    bio: '1/8 nitro since the pull-start days. Moderates with a light hand.',
  },
  {
    handle: 'juno_braithwick',
    email: 'juno@racers.example',
    password: 'hollow-pines-laps-2',
    classesRaced: ['buggy-1-8-electric', 'truggy-1-8-electric'],
    displayName: 'Juno Braithwick',
    role: 'racer',
    homeTrack: 'Hollow Pines Circuit',
    bio: 'Electric buggy and truggy. Changes one thing at a time and writes it down.',
  },
  {
    handle: 'pell-strand',
    email: 'pell@racers.example',
    password: 'brackwater-ruts-9',
    classesRaced: ['truggy-1-8-nitro'],
    displayName: 'Pell Strand',
    role: 'racer',
    homeTrack: 'Brackwater Dunes',
    bio: 'Truggy on rough tracks; soft springs, thick diffs.',
  },
  {
    handle: 'rafi_new',
    email: 'rafi@racers.example',
    password: 'first-season-stoat-8e',
    classesRaced: ['buggy-1-8-electric'],
    displayName: 'Rafi Lindmoor',
    role: 'racer',
    homeTrack: 'Old Kiln Indoor',
    bio: 'First season with a Stoat 8E straight out of the box.',
  },
];
