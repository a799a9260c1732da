// Trade vocabulary for narration scoring: the many ways drivers and students say the same part.
// Phrases are matched after stemming, longest first, so "brake chamber" wins over "brake".
// Spanish lists carry the English trade words that Spanish-speaking drivers commonly use as is.
import type { Locale } from '../checklist/index.js';

export interface Concept {
  id: string;
  en: readonly string[];
  es: readonly string[];
}

function phrases(list: string): string[] {
  return list
    .split(',')
    .map((phrase) => phrase.trim())
    .filter((phrase) => phrase !== '');
}

// Concepts and cues as a glossary: each id on a line of its own, then its English and its Spanish phrases
// (a longer list goes on over indented lines); "#" starts a heading.
function glossary(table: string): Concept[] {
  const entries: { id: string; en: string[]; es: string[] }[] = [];
  let language: Locale = 'en';
  for (const line of table.split('\n')) {
    if (line.trim() === '' || line.startsWith('#')) continue;
    const entry = entries[entries.length - 1];
    const said = /^ {2}(en|es): (.+)$/.exec(line);
    if (!/^\s/.test(line)) entries.push({ id: line, en: [], es: [] });
    else if (!entry) throw new Error(`Phrases before an id: ${line}`);
    else if (said) {
      language = said[1] === 'es' ? 'es' : 'en';
      entry[language] = phrases(said[2]!);
    } else entry[language].push(...phrases(line.trim()));
  }
  const unsaid = entries.find((entry) => entry.en.length === 0 || entry.es.length === 0);
  if (unsaid) throw new Error(`${unsaid.id} needs its English and its Spanish phrases`);
  return entries;
}

export const CONCEPTS: readonly Concept[] = glossary(`
# Brakes and air
slack_adjuster
  en: slack adjuster, slack adjusters, automatic slack adjuster, slack, slacks, adjuster arm, adjuster, slack arm,
      slack a juster
  es: ajustador, ajustador de holgura, ajustador automatico, regulador de holgura, matraca, slack, slack adjuster
brake_chamber
  en: brake chamber, air chamber, chamber, air can, air cans, brake can, brake cans, pot, pots, brake pot,
      spring brake chamber, maxi can, maxi
  es: camara de freno, camara de aire, camara, pulmon, pulmon de freno, chamber, maxi
stroke
  en: stroke, push rod stroke, pushrod stroke, brake stroke, rod travel, push rod travel, applied stroke
  es: carrera, carrera del vastago, carrera de la varilla, recorrido, recorrido del vastago
pushrod
  en: push rod, pushrod, push rods, brake rod
  es: varilla de empuje, varilla, vastago, push rod
brake_lining
  en: lining, brake lining, brake shoe, brake shoes, shoes, shoe, brake pad, brake pads, pads, friction material
  es: balata, balatas, zapata, zapatas, pastilla, pastillas, forro, forro de freno
brake_drum
  en: drum, brake drum, drums, rotor, brake rotor
  es: tambor, tambor de freno, rotor, disco de freno
brake_hose
  en: brake hose, brake hoses, air line, air lines, air hose, air hoses, brake line, brake lines, hose, hoses
  es: manguera, mangueras, manguera de freno, linea de aire, lineas de aire, manguera de aire, tubo de aire
brake
  en: brake, brakes
  es: freno, frenos
service_brake
  en: service brake, service brakes, service brake test, brake test, brake check, foot brake, brake pedal, stopping test
  es: freno de servicio, frenos de servicio, prueba de freno, prueba de frenos, pedal de freno, pedal del freno
air_loss
  en: air loss, air leak, air leaks, air leakage, leakage, leak down, leak test, leak down test, losing air, air drop
  es: perdida de aire, fuga de aire, fugas de aire, prueba de fugas, perdida, caida de presion
brakes_released
  en: brakes released, brakes off, released, brakes released, release the brakes
  es: frenos sueltos, sueltos, liberados, frenos liberados, frenos quitados
brakes_applied
  en: brakes applied, brake applied, applied, fully applied, full application, foot on the brake, holding the brake,
      pressing the brake
  es: frenos aplicados, freno aplicado, aplicados, aplicado, pisando el freno, aplicacion
parking_brake
  en: parking brake, parking brakes, park brake, emergency brake, yellow knob
  es: freno de estacionamiento, frenos de estacionamiento, freno de mano, freno de parqueo, freno de emergencia,
      perilla amarilla
spring_brake
  en: spring brake, spring brakes, spring brake valve, valve pops out, pops out, brakes pop
  es: frenos de resorte, freno de resorte, salta la valvula, valvula salta, botan los frenos
air_tank
  en: air tank, air tanks, reservoir, reservoirs, drain valve, air dryer
  es: tanque de aire, tanques de aire, deposito de aire, purga, secador de aire
gauge
  en: gauge, gauges, air gauge, pressure gauge, dash gauges, dash
  es: manometro, manometros, medidor, medidores, reloj, relojes, indicador, indicadores, tablero
governor
  en: governor
  es: gobernador
cut_out
  en: cut out, cutout, cut off, cuts out, cuts off, compressor stops, stops building, shuts off
  es: corte del gobernador, presion de corte, se corta, deja de cargar, corte de aire
cut_in
  en: cut in, cutin, cuts in, kicks in, compressor starts, starts building, starts again
  es: arranque, arranque del gobernador, vuelve a cargar, empieza a cargar, vuelve a arrancar
build_up
  en: build up, buildup, builds up, air build up, pressure build up, air pressure build up, building air, builds,
      build up time
  es: acumulacion, acumulacion de presion, acumulacion de presion de aire, sube la presion, llenado de aire,
      carga de aire
low_air_warning
  en: low air warning, low air, warning buzzer, buzzer, low air alarm
  es: alarma de baja presion, alarma de aire, alarma, zumbador, chicharra
compressor
  en: compressor, air compressor
  es: compresor, compresor de aire

# Tires, wheels, hubs
tire
  en: tire, tires, tyre, tyres
  es: llanta, llantas, neumatico, neumaticos, goma, gomas, cubierta, cubiertas
tread
  en: tread, treads, tread depth, tread wear, groove, grooves
  es: dibujo, profundidad del dibujo, profundidad, profundidad de la banda, banda de rodamiento, banda de rodadura,
      huella, ranura, ranuras, piso, tread
sidewall
  en: sidewall, sidewalls, side wall, side walls
  es: costado, costados, pared lateral, flanco, cara lateral
inflation
  en: inflation, inflated, air pressure, tire pressure, pressure, pressures, underinflated, under inflated
  es: presion, presion de aire, inflado, inflada, inflados, infladas, libras
valve_stem
  en: valve stem, valve stems, valve cap, valve caps
  es: valvula, valvulas, pivote de valvula
rim
  en: rim, rims, wheel, wheels, disc wheel
  es: rin, rines, rim, rueda, ruedas, aro, aros
lug_nuts
  en: lug nuts, lug nut, lugs, lug, wheel nuts, nuts, studs, lug bolts
  es: birlos, birlo, tuercas, tuerca, tuercas de rueda, tuercas de la rueda, tuercas de las ruedas, esparragos
hub_seal
  en: hub seal, hub seals, hub oil, hub oil level, hub, hubs, hub cap, wheel seal, oil seal
  es: sello de rueda, reten, retenes, sello de maza, maza, mazas, masa, aceite de maza, mamelon, hub
spacer
  en: spacer, spacers, dual spacer
  es: separador, separadores, espaciador
dual_spacing
  en: dual spacing, spacing, space between, not touching, touching, gap between the duals, between the duals
  es: separacion entre llantas, separacion, espacio entre, no se tocan, se tocan, entre las dobles, entre las duales

# Suspension
air_spring
  en: airbag, airbags, air bag, air bags, air spring, air springs, bag, bags, air suspension
  es: bolsa de aire, bolsas de aire, bolsa, bolsas, fuelle, fuelles, globo, globos, airbag, suspension de aire
leaf_spring
  en: spring, springs, leaf spring, leaf springs, leaf, leaves, spring pack
  es: muelle, muelles, hoja, hojas, resorte, resortes, ballesta
u_bolts
  en: u bolt, u bolts, ubolt, ubolts, you bolt, you bolts
  es: abrazadera, abrazaderas, perno en u, pernos en u, u bolt, u bolts
spring_hanger
  en: spring hanger, spring hangers, hanger, hangers, spring mount
  es: soporte de muelle, soportes de muelle, colgante, percha, gemela
torque_rod
  en: torque rod, torque rods, torque arm, radius rod
  es: barra de torque, barras de torque, barra de torsion, barras de torsion, tirante, tirantes, brazo de torque
shock
  en: shock, shocks, shock absorber, shock absorbers
  es: amortiguador, amortiguadores

# Steering
steering_box
  en: steering box, steering gear, gear box, gearbox
  es: caja de direccion, caja de engranes, caja de la direccion
steering_linkage
  en: steering linkage, linkage, tie rod, tie rods, drag link, pitman arm, steering arm, tie rod ends
  es: varillaje, barra de direccion, barra de acoplamiento, terminales, terminal, brazo pitman, bieleta,
      barra de dirección
steering_wheel
  en: steering wheel, steering play, free play, lash, steering lash, play in the wheel
  es: volante, juego del volante, juego libre, holgura del volante
power_steering
  en: power steering, power steering fluid, steering fluid
  es: direccion hidraulica, bomba de direccion, aceite de direccion

# Coupling
glad_hands
  en: glad hands, gladhands, glad hand, gladhand, glad hans, couplers, coupler, air couplers
  es: manitas, manos de acople, acopladores, acoplador, gladhands, glad hands, conectores de aire
electric_line
  en: pigtail, electrical line, electric line, electrical cord, light cord, seven way, 7 way, electrical connector, plug
  es: cable electrico, conector electrico, pigtail, cola de cochino, enchufe, cable de luces
fifth_wheel
  en: fifth wheel, 5th wheel, fifth wheel plate, skid plate, mounting plate
  es: quinta rueda, 5ta rueda, plato, plato de quinta rueda, placa de montaje
fifth_wheel_gap
  en: gap, no gap, contact, sits flat, sitting flat, no space
  es: contacto, espacio, sin espacio, hueco, asienta plana, asentada
kingpin
  en: kingpin, king pin, pin
  es: perno rey, perno maestro, king pin, kingpin
apron
  en: apron, upper plate, upper coupler, bolster plate
  es: placa superior, placa de apoyo, placa, placa del remolque
jaws
  en: jaws, locking jaws, locking jaw, lock, locks
  es: mordazas, mordaza, quijadas, seguro, candado
release_arm
  en: release arm, release handle, pull handle, release lever
  es: palanca de liberacion, palanca de desenganche, palanca
slider
  en: slider, sliding, sliding fifth wheel, sliding pins, slider pins, locking pins, tandem pins, sliding tandem
  es: deslizador, deslizable, quinta rueda deslizable, pernos del deslizador, pernos de seguro, pines, corredera
landing_gear
  en: landing gear, dolly legs, landing legs, crank handle, dollies
  es: patas, patas de apoyo, tren de aterrizaje, patines, manivela

# Frame, body, fuel, engine
front_wall
  en: front wall, header, header board, nose, bulkhead
  es: pared frontal, pared delantera, frente del remolque
frame
  en: frame, frame rails, frame rail, rails, cross members, crossmembers, cross member
  es: chasis, bastidor, larguero, largueros, travesanos, travesano
mud_flap
  en: mud flap, mud flaps, mudflap, mudflaps, splash guard, splash guards, flap, flaps
  es: lodera, loderas, faldon, faldones, salpicadera, guardalodos
fuel_tank
  en: fuel tank, fuel tanks, diesel tank, tank, tanks, fuel cap, fuel caps
  es: tanque de combustible, tanque de diesel, tanque, tanques, tapon de combustible
exhaust
  en: exhaust, muffler, stack, exhaust pipe, tail pipe
  es: escape, mofle, silenciador, chimenea, tubo de escape
battery
  en: battery, batteries, battery box
  es: bateria, baterias, caja de baterias
drive_shaft
  en: drive shaft, driveshaft, drive line, driveline, u joint, u joints, universal joint
  es: flecha cardan, cardan, flecha, eje cardan, cruceta, crucetas
door
  en: door, doors, hinges, hinge, door seals
  es: puerta, puertas, bisagra, bisagras
steps
  en: steps, step, catwalk, grab handle, grab handles, grab bar
  es: escalon, escalones, estribo, estribos, agarradera, agarraderas
oil
  en: oil level, engine oil, dipstick, oil, dip stick
  es: aceite, nivel de aceite, bayoneta, aceite de motor, varilla de aceite
coolant
  en: coolant, antifreeze, radiator, coolant level
  es: anticongelante, refrigerante, radiador
belts
  en: belt, belts, drive belt, fan belt, serpentine belt
  es: banda, bandas, correa, correas, banda del ventilador
alternator
  en: alternator
  es: alternador
water_pump
  en: water pump
  es: bomba de agua

# Lights, glass, cab, emergency
headlight
  en: headlight, headlights, head light, head lights, headlamp, headlamps, high beams, low beams, high beam, low beam
  es: faro, faros, faros delanteros, luces altas, luces bajas, luz alta, luz baja
turn_signal
  en: turn signal, turn signals, blinker, blinkers, signals, signal, indicators
  es: direccional, direccionales, luces direccionales, intermitente, intermitentes
clearance_light
  en: clearance, identification, clearance light, clearance lights, clearance lamps, identification lamps, marker light,
      marker lights, markers, marker lamps, identification lights, id lights, side markers
  es: luces de galibo, galibo, galibos, identificacion, luces delanteras de galibo, luces traseras de galibo,
      luces de posicion, plafones, plafon, marcadores, luces laterales
tail_light
  en: tail light, tail lights, taillight, taillights, tail lamps, tail lamp
  es: calavera, calaveras, luces traseras, luz trasera
brake_light
  en: brake light, brake lights, stop light, stop lights, stop lamps
  es: luces de freno, luz de freno, luces de stop, stop
hazard_light
  en: hazards, hazard lights, four ways, 4 ways, flashers, emergency flashers
  es: luces de emergencia, intermitentes de emergencia, preventivas, luces preventivas
reflector
  en: reflector, reflectors
  es: reflector, reflectores, catadioptrico, catadioptricos
conspicuity
  en: reflective sheeting, reflective tape, conspicuity tape, conspicuity, sheeting, dot tape, reflective
  es: cinta reflectante, cinta reflejante, cintas reflejantes, cintas reflectantes, lamina reflejante, cinta, reflejante
plate_light
  en: license plate light, licence plate lamp, license plate lamp, plate lamp, plate light, license plate,
      licence plate, license light
  es: luz de placa, luz de la placa, lampara de placa
backup_light
  en: back up lamp, back up light, back up lights, backup light, backup lights, backup lamp, reverse light,
      reverse lights
  es: luz de reversa, luces de reversa, reversa, luz de marcha atras
light
  en: light, lights, lamp, lamps, lens, lenses
  es: luz, luces, lampara, lamparas, foco, focos, mica, micas
mirror
  en: mirror, mirrors
  es: espejo, espejos, retrovisor, retrovisores
windshield
  en: windshield, windscreen, glass
  es: parabrisas, cristal, vidrio
wipers
  en: wiper, wipers, wiper blades, wiper blade, washer fluid
  es: limpiaparabrisas, limpiadores, plumas, limpias, pluma
horn
  en: horn, horns, air horn, city horn
  es: claxon, bocina, pito, corneta
fire_extinguisher
  en: fire extinguisher, extinguisher
  es: extintor, extinguidor, extinguidor de incendios
warning_triangles
  en: triangles, triangle, reflective triangles, warning triangles, warning devices, flares, fusees
  es: triangulos, triangulo, triangulos reflectantes, senales de advertencia, bengalas
spare_fuses
  en: spare fuses, fuses, fuse
  es: fusibles, fusible, fusibles de repuesto
seat_belt
  en: seat belt, seat belts, seatbelt, seatbelts
  es: cinturon, cinturon de seguridad
heater
  en: heater, defroster, defrost
  es: calefaccion, desempanador, desempañador
`);

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

const CUE_KINDS: Record<string, CueKind> = {
  left: { type: 'side', side: 'left' },
  right: { type: 'side', side: 'right' },
  power_unit: { type: 'unit', unit: 'power' },
  trailer_unit: { type: 'unit', unit: 'trailer' },
  steer_axle: { type: 'axle_kind', axle: 'steer' },
  drive_axle: { type: 'axle_kind', axle: 'drive' },
  trailer_axle: { type: 'axle_kind', axle: 'trailer' },
  ordinal_1: { type: 'ordinal', ordinal: 1 },
  ordinal_2: { type: 'ordinal', ordinal: 2 },
  ordinal_3: { type: 'ordinal', ordinal: 3 },
  last: { type: 'ordinal', ordinal: 'last' },
  inner: { type: 'dual', dual: 'inner' },
  outer: { type: 'dual', dual: 'outer' },
  both: { type: 'both' },
  axle_word: { type: 'axle_word' },
  filler: { type: 'filler' },
};

// In North America the driver sits on the left: "driver side" is left, "curb side" is right.
export const CUES: readonly Cue[] = glossary(`
left
  en: left, left side, left hand, driver side, drivers side, road side, roadside, street side
  es: izquierdo, izquierda, izquierdos, izquierdas, lado izquierdo, lado del conductor, lado del chofer,
      lado del operador, left
right
  en: right, right side, right hand, passenger side, passengers side, curb side, curbside, officer side
  es: derecho, derecha, derechos, derechas, lado derecho, lado del pasajero, lado del copiloto, lado de la banqueta,
      right
power_unit
  en: tractor, truck, power unit, bus
  es: tractor, tracto, tractocamion, camion, unidad motriz, autobus
trailer_unit
  en: trailer, semi trailer, semitrailer, reefer
  es: remolque, semirremolque, semiremolque, caja, trailer, traila
steer_axle
  en: steer, steers, steer axle, steering axle
  es: eje delantero, eje de direccion, eje direccional, eje de la direccion, steer
drive_axle
  en: drive, drives, drive axle, drive axles, drivers, drive tandem
  es: eje de traccion, ejes de traccion, traccion, eje motriz, motriz, motrices, drive
trailer_axle
  en: trailer axle, trailer axles, trailer tandem
  es: eje del remolque, ejes del remolque, eje de la caja, ejes de la caja
ordinal_1
  en: front, first, 1st, forward, lead, leading
  es: delantero, delantera, delanteros, delanteras, primer, primero, primera, de adelante, frente
ordinal_2
  en: second, 2nd
  es: segundo, segunda
ordinal_3
  en: third, 3rd
  es: tercer, tercero, tercera
last
  en: rear, back, last, rearmost
  es: trasero, trasera, traseros, traseras, de atras, ultimo, ultima
inner
  en: inner, inners, inside, inboard
  es: interior, interiores, interna, interno, internas, de adentro, de dentro
outer
  en: outer, outers, outside, outboard
  es: exterior, exteriores, externa, externo, externas, de afuera, de fuera
both
  en: both, duals, all, pair, each
  es: ambos, ambas, las dos, los dos, duales, dobles, gemelas, todas, todos, cada
axle_word
  en: axle, axles
  es: eje, ejes

# Said but meaning nothing about position.
filler
  en: all right, alright, right now, thats right, right here, right there, back up
  es: derecho a, todo bien, ahora si
`).map(({ id, en, es }) => {
  const cue = CUE_KINDS[id];
  if (!cue) throw new Error(`No cue kind for ${id}`);
  return { cue, en, es };
});

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
