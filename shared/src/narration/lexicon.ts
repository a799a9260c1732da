// Trade vocabulary for narration scoring: the many ways drivers and students say the same part.
// Phrases are matched after stemming, longest first, so "brake chamber" wins over "brake".
// Spanish lists carry the English trade words that Spanish-speaking drivers commonly use as is.
import type { Locale } from '../checklist/index.js';

export interface Concept {
  id: string;
  en: readonly string[];
  es: readonly string[];
}

// Each concept and cue lists its phrases in one string, separated by commas.
function phrases(list: string): string[] {
  return list.split(', ');
}

function concept(id: string, en: string, es: string): Concept {
  return { id, en: phrases(en), es: phrases(es) };
}

export const CONCEPTS: readonly Concept[] = [
  // Brakes and air
  concept(
    'slack_adjuster',
    'slack adjuster, slack adjusters, automatic slack adjuster, slack, slacks, adjuster arm, adjuster, slack arm, ' +
      'slack a juster',
    'ajustador, ajustador de holgura, ajustador automatico, regulador de holgura, matraca, slack, slack adjuster',
  ),
  concept(
    'brake_chamber',
    'brake chamber, air chamber, chamber, air can, air cans, brake can, brake cans, pot, pots, brake pot, ' +
      'spring brake chamber, maxi can, maxi',
    'camara de freno, camara de aire, camara, pulmon, pulmon de freno, chamber, maxi',
  ),
  concept(
    'stroke',
    'stroke, push rod stroke, pushrod stroke, brake stroke, rod travel, push rod travel, applied stroke',
    'carrera, carrera del vastago, carrera de la varilla, recorrido, recorrido del vastago',
  ),
  concept('pushrod', 'push rod, pushrod, push rods, brake rod', 'varilla de empuje, varilla, vastago, push rod'),
  concept(
    'brake_lining',
    'lining, brake lining, brake shoe, brake shoes, shoes, shoe, brake pad, brake pads, pads, friction material',
    'balata, balatas, zapata, zapatas, pastilla, pastillas, forro, forro de freno',
  ),
  concept(
    'brake_drum',
    'drum, brake drum, drums, rotor, brake rotor',
    'tambor, tambor de freno, rotor, disco de freno',
  ),
  concept(
    'brake_hose',
    'brake hose, brake hoses, air line, air lines, air hose, air hoses, brake line, brake lines, hose, hoses',
    'manguera, mangueras, manguera de freno, linea de aire, lineas de aire, manguera de aire, tubo de aire',
  ),
  concept('brake', 'brake, brakes', 'freno, frenos'),
  concept(
    'service_brake',
    'service brake, service brakes, service brake test, brake test, brake check, foot brake, brake pedal, ' +
      'stopping test',
    'freno de servicio, frenos de servicio, prueba de freno, prueba de frenos, pedal de freno, pedal del freno',
  ),
  concept(
    'air_loss',
    'air loss, air leak, air leaks, air leakage, leakage, leak down, leak test, leak down test, losing air, air drop',
    'perdida de aire, fuga de aire, fugas de aire, prueba de fugas, perdida, caida de presion',
  ),
  concept(
    'brakes_released',
    'brakes released, brakes off, released, brakes released, release the brakes',
    'frenos sueltos, sueltos, liberados, frenos liberados, frenos quitados',
  ),
  concept(
    'brakes_applied',
    'brakes applied, brake applied, applied, fully applied, full application, foot on the brake, ' +
      'holding the brake, pressing the brake',
    'frenos aplicados, freno aplicado, aplicados, aplicado, pisando el freno, aplicacion',
  ),
  concept(
    'parking_brake',
    'parking brake, parking brakes, park brake, emergency brake, yellow knob',
    'freno de estacionamiento, frenos de estacionamiento, freno de mano, freno de parqueo, freno de emergencia, ' +
      'perilla amarilla',
  ),
  concept(
    'spring_brake',
    'spring brake, spring brakes, spring brake valve, valve pops out, pops out, brakes pop',
    'frenos de resorte, freno de resorte, salta la valvula, valvula salta, botan los frenos',
  ),
  concept(
    'air_tank',
    'air tank, air tanks, reservoir, reservoirs, drain valve, air dryer',
    'tanque de aire, tanques de aire, deposito de aire, purga, secador de aire',
  ),
  concept(
    'gauge',
    'gauge, gauges, air gauge, pressure gauge, dash gauges, dash',
    'manometro, manometros, medidor, medidores, reloj, relojes, indicador, indicadores, tablero',
  ),
  concept('governor', 'governor', 'gobernador'),
  concept(
    'cut_out',
    'cut out, cutout, cut off, cuts out, cuts off, compressor stops, stops building, shuts off',
    'corte del gobernador, presion de corte, se corta, deja de cargar, corte de aire',
  ),
  concept(
    'cut_in',
    'cut in, cutin, cuts in, kicks in, compressor starts, starts building, starts again',
    'arranque, arranque del gobernador, vuelve a cargar, empieza a cargar, vuelve a arrancar',
  ),
  concept(
    'build_up',
    'build up, buildup, builds up, air build up, pressure build up, air pressure build up, building air, builds, ' +
      'build up time',
    'acumulacion, acumulacion de presion, acumulacion de presion de aire, sube la presion, llenado de aire, ' +
      'carga de aire',
  ),
  concept(
    'low_air_warning',
    'low air warning, low air, warning buzzer, buzzer, low air alarm',
    'alarma de baja presion, alarma de aire, alarma, zumbador, chicharra',
  ),
  concept('compressor', 'compressor, air compressor', 'compresor, compresor de aire'),
  // Tires, wheels, hubs
  concept(
    'tire',
    'tire, tires, tyre, tyres',
    'llanta, llantas, neumatico, neumaticos, goma, gomas, cubierta, cubiertas',
  ),
  concept(
    'tread',
    'tread, treads, tread depth, tread wear, groove, grooves',
    'dibujo, profundidad del dibujo, profundidad, profundidad de la banda, banda de rodamiento, banda de rodadura, ' +
      'huella, ranura, ranuras, piso, tread',
  ),
  concept(
    'sidewall',
    'sidewall, sidewalls, side wall, side walls',
    'costado, costados, pared lateral, flanco, cara lateral',
  ),
  concept(
    'inflation',
    'inflation, inflated, air pressure, tire pressure, pressure, pressures, underinflated, under inflated',
    'presion, presion de aire, inflado, inflada, inflados, infladas, libras',
  ),
  concept('valve_stem', 'valve stem, valve stems, valve cap, valve caps', 'valvula, valvulas, pivote de valvula'),
  concept('rim', 'rim, rims, wheel, wheels, disc wheel', 'rin, rines, rim, rueda, ruedas, aro, aros'),
  concept(
    'lug_nuts',
    'lug nuts, lug nut, lugs, lug, wheel nuts, nuts, studs, lug bolts',
    'birlos, birlo, tuercas, tuerca, tuercas de rueda, tuercas de la rueda, tuercas de las ruedas, esparragos',
  ),
  concept(
    'hub_seal',
    'hub seal, hub seals, hub oil, hub oil level, hub, hubs, hub cap, wheel seal, oil seal',
    'sello de rueda, reten, retenes, sello de maza, maza, mazas, masa, aceite de maza, mamelon, hub',
  ),
  concept('spacer', 'spacer, spacers, dual spacer', 'separador, separadores, espaciador'),
  concept(
    'dual_spacing',
    'dual spacing, spacing, space between, not touching, touching, gap between the duals, between the duals',
    'separacion entre llantas, separacion, espacio entre, no se tocan, se tocan, entre las dobles, entre las duales',
  ),
  // Suspension
  concept(
    'air_spring',
    'airbag, airbags, air bag, air bags, air spring, air springs, bag, bags, air suspension',
    'bolsa de aire, bolsas de aire, bolsa, bolsas, fuelle, fuelles, globo, globos, airbag, suspension de aire',
  ),
  concept(
    'leaf_spring',
    'spring, springs, leaf spring, leaf springs, leaf, leaves, spring pack',
    'muelle, muelles, hoja, hojas, resorte, resortes, ballesta',
  ),
  concept(
    'u_bolts',
    'u bolt, u bolts, ubolt, ubolts, you bolt, you bolts',
    'abrazadera, abrazaderas, perno en u, pernos en u, u bolt, u bolts',
  ),
  concept(
    'spring_hanger',
    'spring hanger, spring hangers, hanger, hangers, spring mount',
    'soporte de muelle, soportes de muelle, colgante, percha, gemela',
  ),
  concept(
    'torque_rod',
    'torque rod, torque rods, torque arm, radius rod',
    'barra de torque, barras de torque, barra de torsion, barras de torsion, tirante, tirantes, brazo de torque',
  ),
  concept('shock', 'shock, shocks, shock absorber, shock absorbers', 'amortiguador, amortiguadores'),
  // Steering
  concept(
    'steering_box',
    'steering box, steering gear, gear box, gearbox',
    'caja de direccion, caja de engranes, caja de la direccion',
  ),
  concept(
    'steering_linkage',
    'steering linkage, linkage, tie rod, tie rods, drag link, pitman arm, steering arm, tie rod ends',
    'varillaje, barra de direccion, barra de acoplamiento, terminales, terminal, brazo pitman, bieleta, ' +
      'barra de dirección',
  ),
  concept(
    'steering_wheel',
    'steering wheel, steering play, free play, lash, steering lash, play in the wheel',
    'volante, juego del volante, juego libre, holgura del volante',
  ),
  concept(
    'power_steering',
    'power steering, power steering fluid, steering fluid',
    'direccion hidraulica, bomba de direccion, aceite de direccion',
  ),
  // Coupling
  concept(
    'glad_hands',
    'glad hands, gladhands, glad hand, gladhand, glad hans, couplers, coupler, air couplers',
    'manitas, manos de acople, acopladores, acoplador, gladhands, glad hands, conectores de aire',
  ),
  concept(
    'electric_line',
    'pigtail, electrical line, electric line, electrical cord, light cord, seven way, 7 way, electrical connector, ' +
      'plug',
    'cable electrico, conector electrico, pigtail, cola de cochino, enchufe, cable de luces',
  ),
  concept(
    'fifth_wheel',
    'fifth wheel, 5th wheel, fifth wheel plate, skid plate, mounting plate',
    'quinta rueda, 5ta rueda, plato, plato de quinta rueda, placa de montaje',
  ),
  concept(
    'fifth_wheel_gap',
    'gap, no gap, contact, sits flat, sitting flat, no space',
    'contacto, espacio, sin espacio, hueco, asienta plana, asentada',
  ),
  concept('kingpin', 'kingpin, king pin, pin', 'perno rey, perno maestro, king pin, kingpin'),
  concept(
    'apron',
    'apron, upper plate, upper coupler, bolster plate',
    'placa superior, placa de apoyo, placa, placa del remolque',
  ),
  concept('jaws', 'jaws, locking jaws, locking jaw, lock, locks', 'mordazas, mordaza, quijadas, seguro, candado'),
  concept(
    'release_arm',
    'release arm, release handle, pull handle, release lever',
    'palanca de liberacion, palanca de desenganche, palanca',
  ),
  concept(
    'slider',
    'slider, sliding, sliding fifth wheel, sliding pins, slider pins, locking pins, tandem pins, sliding tandem',
    'deslizador, deslizable, quinta rueda deslizable, pernos del deslizador, pernos de seguro, pines, corredera',
  ),
  concept(
    'landing_gear',
    'landing gear, dolly legs, landing legs, crank handle, dollies',
    'patas, patas de apoyo, tren de aterrizaje, patines, manivela',
  ),
  // Frame, body, fuel, engine
  concept(
    'front_wall',
    'front wall, header, header board, nose, bulkhead',
    'pared frontal, pared delantera, frente del remolque',
  ),
  concept(
    'frame',
    'frame, frame rails, frame rail, rails, cross members, crossmembers, cross member',
    'chasis, bastidor, larguero, largueros, travesanos, travesano',
  ),
  concept(
    'mud_flap',
    'mud flap, mud flaps, mudflap, mudflaps, splash guard, splash guards, flap, flaps',
    'lodera, loderas, faldon, faldones, salpicadera, guardalodos',
  ),
  concept(
    'fuel_tank',
    'fuel tank, fuel tanks, diesel tank, tank, tanks, fuel cap, fuel caps',
    'tanque de combustible, tanque de diesel, tanque, tanques, tapon de combustible',
  ),
  concept(
    'exhaust',
    'exhaust, muffler, stack, exhaust pipe, tail pipe',
    'escape, mofle, silenciador, chimenea, tubo de escape',
  ),
  concept('battery', 'battery, batteries, battery box', 'bateria, baterias, caja de baterias'),
  concept(
    'drive_shaft',
    'drive shaft, driveshaft, drive line, driveline, u joint, u joints, universal joint',
    'flecha cardan, cardan, flecha, eje cardan, cruceta, crucetas',
  ),
  concept('door', 'door, doors, hinges, hinge, door seals', 'puerta, puertas, bisagra, bisagras'),
  concept(
    'steps',
    'steps, step, catwalk, grab handle, grab handles, grab bar',
    'escalon, escalones, estribo, estribos, agarradera, agarraderas',
  ),
  concept(
    'oil',
    'oil level, engine oil, dipstick, oil, dip stick',
    'aceite, nivel de aceite, bayoneta, aceite de motor, varilla de aceite',
  ),
  concept('coolant', 'coolant, antifreeze, radiator, coolant level', 'anticongelante, refrigerante, radiador'),
  concept(
    'belts',
    'belt, belts, drive belt, fan belt, serpentine belt',
    'banda, bandas, correa, correas, banda del ventilador',
  ),
  concept('alternator', 'alternator', 'alternador'),
  concept('water_pump', 'water pump', 'bomba de agua'),
  // Lights, glass, cab, emergency
  concept(
    'headlight',
    'headlight, headlights, head light, head lights, headlamp, headlamps, high beams, low beams, high beam, low beam',
    'faro, faros, faros delanteros, luces altas, luces bajas, luz alta, luz baja',
  ),
  concept(
    'turn_signal',
    'turn signal, turn signals, blinker, blinkers, signals, signal, indicators',
    'direccional, direccionales, luces direccionales, intermitente, intermitentes',
  ),
  concept(
    'clearance_light',
    'clearance, identification, clearance light, clearance lights, clearance lamps, identification lamps, ' +
      'marker light, marker lights, markers, marker lamps, identification lights, id lights, side markers',
    'luces de galibo, galibo, galibos, identificacion, luces delanteras de galibo, luces traseras de galibo, ' +
      'luces de posicion, plafones, plafon, marcadores, luces laterales',
  ),
  concept(
    'tail_light',
    'tail light, tail lights, taillight, taillights, tail lamps, tail lamp',
    'calavera, calaveras, luces traseras, luz trasera',
  ),
  concept(
    'brake_light',
    'brake light, brake lights, stop light, stop lights, stop lamps',
    'luces de freno, luz de freno, luces de stop, stop',
  ),
  concept(
    'hazard_light',
    'hazards, hazard lights, four ways, 4 ways, flashers, emergency flashers',
    'luces de emergencia, intermitentes de emergencia, preventivas, luces preventivas',
  ),
  concept('reflector', 'reflector, reflectors', 'reflector, reflectores, catadioptrico, catadioptricos'),
  concept(
    'conspicuity',
    'reflective sheeting, reflective tape, conspicuity tape, conspicuity, sheeting, dot tape, reflective',
    'cinta reflectante, cinta reflejante, cintas reflejantes, cintas reflectantes, lamina reflejante, cinta, ' +
      'reflejante',
  ),
  concept(
    'plate_light',
    'license plate light, licence plate lamp, license plate lamp, plate lamp, plate light, license plate, ' +
      'licence plate, license light',
    'luz de placa, luz de la placa, lampara de placa',
  ),
  concept(
    'backup_light',
    'back up lamp, back up light, back up lights, backup light, backup lights, backup lamp, reverse light, ' +
      'reverse lights',
    'luz de reversa, luces de reversa, reversa, luz de marcha atras',
  ),
  concept(
    'light',
    'light, lights, lamp, lamps, lens, lenses',
    'luz, luces, lampara, lamparas, foco, focos, mica, micas',
  ),
  concept('mirror', 'mirror, mirrors', 'espejo, espejos, retrovisor, retrovisores'),
  concept('windshield', 'windshield, windscreen, glass', 'parabrisas, cristal, vidrio'),
  concept(
    'wipers',
    'wiper, wipers, wiper blades, wiper blade, washer fluid',
    'limpiaparabrisas, limpiadores, plumas, limpias, pluma',
  ),
  concept('horn', 'horn, horns, air horn, city horn', 'claxon, bocina, pito, corneta'),
  concept('fire_extinguisher', 'fire extinguisher, extinguisher', 'extintor, extinguidor, extinguidor de incendios'),
  concept(
    'warning_triangles',
    'triangles, triangle, reflective triangles, warning triangles, warning devices, flares, fusees',
    'triangulos, triangulo, triangulos reflectantes, senales de advertencia, bengalas',
  ),
  concept('spare_fuses', 'spare fuses, fuses, fuse', 'fusibles, fusible, fusibles de repuesto'),
  concept('seat_belt', 'seat belt, seat belts, seatbelt, seatbelts', 'cinturon, cinturon de seguridad'),
  concept('heater', 'heater, defroster, defrost', 'calefaccion, desempanador, desempañador'),
];

// Words that only qualify a more specific part ("brake air lines", "wheel nuts"): required only
// when nothing more specific is in the title.
export const BROAD_CONCEPTS: ReadonlySet<string> = new Set([
  '#brake',
  '#light',
  '#tire',
  '#rim',
  '#governor',
  '#fifth_wheel',
]);

// Where on the vehicle: these set the position context instead of naming a part.
export type CueKind =
  | { type: 'side'; side: 'left' | 'right' }
  | { type: 'unit'; unit: 'power' | 'trailer' }
  | { type: 'axle_kind'; axle: 'steer' | 'drive' | 'trailer' }
  | { type: 'ordinal'; ordinal: number | 'last' }
  | { type: 'dual'; dual: 'inner' | 'outer' }
  | { type: 'both' }
  | { type: 'axle_word' }
  | { type: 'filler' };

export interface Cue {
  cue: CueKind;
  en: readonly string[];
  es: readonly string[];
}

function cue(kind: CueKind, en: string, es: string): Cue {
  return { cue: kind, en: phrases(en), es: phrases(es) };
}

// In North America the driver sits on the left: "driver side" is left, "curb side" is right.
export const CUES: readonly Cue[] = [
  cue(
    { type: 'side', side: 'left' },
    'left, left side, left hand, driver side, drivers side, road side, roadside, street side',
    'izquierdo, izquierda, izquierdos, izquierdas, lado izquierdo, lado del conductor, lado del chofer, ' +
      'lado del operador, left',
  ),
  cue(
    { type: 'side', side: 'right' },
    'right, right side, right hand, passenger side, passengers side, curb side, curbside, officer side',
    'derecho, derecha, derechos, derechas, lado derecho, lado del pasajero, lado del copiloto, ' +
      'lado de la banqueta, right',
  ),
  cue(
    { type: 'unit', unit: 'power' },
    'tractor, truck, power unit, bus',
    'tractor, tracto, tractocamion, camion, unidad motriz, autobus',
  ),
  cue(
    { type: 'unit', unit: 'trailer' },
    'trailer, semi trailer, semitrailer, reefer',
    'remolque, semirremolque, semiremolque, caja, trailer, traila',
  ),
  cue(
    { type: 'axle_kind', axle: 'steer' },
    'steer, steers, steer axle, steering axle',
    'eje delantero, eje de direccion, eje direccional, eje de la direccion, steer',
  ),
  cue(
    { type: 'axle_kind', axle: 'drive' },
    'drive, drives, drive axle, drive axles, drivers, drive tandem',
    'eje de traccion, ejes de traccion, traccion, eje motriz, motriz, motrices, drive',
  ),
  cue(
    { type: 'axle_kind', axle: 'trailer' },
    'trailer axle, trailer axles, trailer tandem',
    'eje del remolque, ejes del remolque, eje de la caja, ejes de la caja',
  ),
  cue(
    { type: 'ordinal', ordinal: 1 },
    'front, first, 1st, forward, lead, leading',
    'delantero, delantera, delanteros, delanteras, primer, primero, primera, de adelante, frente',
  ),
  cue({ type: 'ordinal', ordinal: 2 }, 'second, 2nd', 'segundo, segunda'),
  cue({ type: 'ordinal', ordinal: 3 }, 'third, 3rd', 'tercer, tercero, tercera'),
  cue(
    { type: 'ordinal', ordinal: 'last' },
    'rear, back, last, rearmost',
    'trasero, trasera, traseros, traseras, de atras, ultimo, ultima',
  ),
  cue(
    { type: 'dual', dual: 'inner' },
    'inner, inners, inside, inboard',
    'interior, interiores, interna, interno, internas, de adentro, de dentro',
  ),
  cue(
    { type: 'dual', dual: 'outer' },
    'outer, outers, outside, outboard',
    'exterior, exteriores, externa, externo, externas, de afuera, de fuera',
  ),
  cue(
    { type: 'both' },
    'both, duals, all, pair, each',
    'ambos, ambas, las dos, los dos, duales, dobles, gemelas, todas, todos, cada',
  ),
  cue({ type: 'axle_word' }, 'axle, axles', 'eje, ejes'),
  // Said but meaning nothing about position.
  cue(
    { type: 'filler' },
    'all right, alright, right now, thats right, right here, right there, back up',
    'derecho a, todo bien, ahora si',
  ),
];

// Words that name nothing: dropped after phrase matching.
export const STOP_WORDS: Record<Locale, readonly string[]> = {
  en: (
    'a an the and or of on in at to is are was be it its my i im am me this that these those for with ' +
    'there theres here now next then so ok okay um uh check checking checked look looking looks make ' +
    'making sure see going gonna will good fine also as well no not nothing any none properly proper ' +
    'correct correctly we our have has got up down from by into over they them their should must can do ' +
    'does just very like some least more less than which what when where if side'
  ).split(' '),
  es: (
    'el la los las lo un una unos unas y e o u de del al en a que es son esta estan estoy mi mis este ' +
    'estos estas ese esa esos esas para por con sin no ya ahora aqui aca revisando reviso revisar reviso ' +
    'checando checo checar verificando verifico bien buen bueno buena buenas buenos pues eh em ok okey se ' +
    'le les su sus hay tiene tienen ningun ninguna ninguno nada muy como mas menos tambien luego despues ' +
    'voy vamos ver veo correcto correcta correctamente lado parte nos me yo hacia adelante atras desde ' +
    'hasta'
  ).split(' '),
};

// Title words that say how an item is checked, not what it is: left out of what must be named.
export const GENERIC_TITLE_WORDS: Record<Locale, readonly string[]> = {
  en: (
    'condition conditions mounting mounted mount secure secured security inspection general damage ' +
    'operation working function state level'
  ).split(' '),
  es: (
    'estado condicion condiciones montaje sujecion seguridad inspeccion general dano danos funcionamiento ' +
    'nivel fijacion'
  ).split(' '),
};

// Words that end in "s" without being plural.
export const SINGULAR_S: ReadonlySet<string> = new Set([
  'glass',
  'gas',
  'lens',
  'bus',
  'chassis',
  'pass',
  'press',
  'less',
  'cross',
  'axis',
  'psi',
  'parabrisas',
  'limpiaparabrisas',
  'chasis',
  'mas',
  'tras',
  'autobus',
  'abs',
  'its',
  'is',
  'was',
  'has',
  'this',
]);
