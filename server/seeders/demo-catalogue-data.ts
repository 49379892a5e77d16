/**
 * Fictional demo catalogue: every person, household, court, maker, town, institution and
 * document here is invented (towns such as Oderstadt and Velmark do not exist). Pitches,
 * dates and terms are plausible, not historical evidence.
 */
import type { SourceInput } from '@shared/catalogue/schemas';

type Mention = [term: string, language: string, size: string, certainty?: 'certain' | 'probable' | 'conjectural'];
type Pitch = [statement: string, aHz: number, derivation: 'stated' | 'measured' | 'inferred'];
export interface DemoExcerpt {
  at: [type: 'page' | 'folio' | 'signature' | 'column' | 'plate', value: string, facsimilePage: number];
  text: string;
  translation?: string;
  mentions: Mention[];
  pitch?: Pitch[];
  date?: string;
  commentary?: string;
}
export interface DemoSource {
  source: SourceInput;
  pages: number;
  /** approved: reviewed and public; submitted: waiting in the review queue; draft: still with the contributor. */
  state: 'approved' | 'submitted' | 'draft';
  excerpts: DemoExcerpt[];
}

const rights = 'Fictional demo material, invented for Windway; no rights are held by anyone.';
const base = { rightsStatement: rights, facsimileAccess: 'public' as const, calendarNote: 'unstated' as const };

export const demoSources: DemoSource[] = [
  {
    state: 'approved', pages: 24,
    source: { ...base, title: "Principes de la Fleute douce, pour les Amateurs de la Ville d'Oderstadt", sourceType: 'treatise', dateEdtf: '1707', languages: ['fr'], place: 'Oderstadt', creators: [{ name: 'Anselme Dubreuil-Varenne', role: 'author' }], holdingInstitution: 'Library of the Velmark Music Society (fictional)', shelfmark: 'Mus. Th. 88', publication: { publisher: 'Veuve Lambrequin', place: 'Oderstadt', edition: null } },
    excerpts: [
      { at: ['page', '3', 3], text: "La Fleute douce ordinaire est en F ut fa, & l'on nomme Fleute de voix celle qui descend une tierce plus bas.", translation: 'The ordinary recorder is in F, and the one that goes a third lower is called the voice flute.', mentions: [['Fleute douce', 'fr', 'alto', 'certain'], ['Fleute de voix', 'fr', 'voice-flute', 'certain']], commentary: 'The *tierce plus bas* fixes the voice flute a minor third under the alto.' },
      { at: ['page', '7', 7], text: "On accorde la Fleute avec le Hautbois au ton de la Chambre, qui est environ un ton plus bas que celui de la Chapelle.", translation: 'The recorder is tuned with the oboe at chamber pitch, about a tone below chapel pitch.', mentions: [['Fleute', 'fr', 'alto']], pitch: [['au ton de la Chambre, environ un ton plus bas', 392, 'inferred']] },
      { at: ['page', '12', 12], text: 'La petite Fleute a la quarte sonne une octave plus haut que la musique ne se lit.', translation: 'The small flute a fourth up sounds an octave above the written music.', mentions: [['petite Fleute', 'fr', 'soprano', 'probable']] },
      { at: ['page', '15', 15], text: 'Pour la Basse de Fleute il faut un soufle fort & une grande patience.', translation: 'The bass recorder needs a strong breath and great patience.', mentions: [['Basse de Fleute', 'fr', 'bass', 'certain']] },
      { at: ['page', '21', 21], text: "La Flute traversiere n'a qu'une clef, & se joue au meme ton que la Fleute de voix.", translation: 'The transverse flute has only one key and plays at the same pitch as the voice flute.', mentions: [['Flute traversiere', 'fr', 'flute-one-keyed', 'certain'], ['Fleute de voix', 'fr', 'voice-flute']], pitch: [['au meme ton', 392, 'inferred']] },
    ],
  },
  {
    state: 'approved', pages: 16,
    source: { ...base, title: 'Inventarium der Instrumenten in der Hofkapelle zu Velmark', sourceType: 'inventory', dateEdtf: '1712-03', languages: ['de'], place: 'Velmark', creators: [{ name: 'Hans Jörg Pfeilsticker', role: 'compiler' }], holdingInstitution: 'Archive of the Counts of Velmark', shelfmark: 'HK 14/3' },
    excerpts: [
      { at: ['folio', '2r', 3], text: 'Item 4 Blockflöten in einem Futteral, von Buxbaum, im Cammerthon.', translation: 'Item: 4 recorders in a case, of boxwood, at chamber pitch.', mentions: [['Blockflöten', 'de', 'alto', 'probable']], pitch: [['im Cammerthon', 415, 'inferred']] },
      { at: ['folio', '2v', 4], text: 'Item 1 grosse Bass Flöte mit einem messingenen Röhrl.', translation: 'Item: 1 great bass flute with a brass crook.', mentions: [['grosse Bass Flöte', 'de', 'great-bass', 'probable']] },
      { at: ['folio', '3r', 5], text: 'Item 2 Handflöten, so eine Terz tieffer als die Alt Flöten.', translation: 'Item: 2 hand flutes, a third lower than the alto flutes.', mentions: [['Handflöten', 'de', 'voice-flute', 'probable'], ['Alt Flöten', 'de', 'alto', 'certain']] },
      { at: ['folio', '5v', 10], text: 'Item 1 Quart Flötl, gar klein, zerbrochen.', translation: 'Item: 1 small fourth flute, very small, broken.', mentions: [['Quart Flötl', 'de', 'sopranino', 'conjectural']] },
      { at: ['folio', '7r', 13], text: 'Item 3 Traversen mit einer Klappe, neu aus Oderstadt gebracht, im Chorthon zu hoch.', translation: 'Item: 3 transverse flutes with one key, newly brought from Oderstadt, too high at choir pitch.', mentions: [['Traversen', 'de', 'flute-one-keyed', 'certain']], pitch: [['im Chorthon zu hoch', 465, 'inferred']] },
    ],
  },
  {
    state: 'approved', pages: 30,
    source: { ...base, title: 'Rekeningboek van het huis Ter Wilgenhorst', sourceType: 'account', dateEdtf: '1655/1668', languages: ['nl'], place: 'Wilgenhorst', creators: [{ name: 'Pieter Claesz van Rietveen', role: 'scribe' }], holdingInstitution: 'Archive of the Counts of Velmark', shelfmark: 'Rek. WH 2' },
    excerpts: [
      { at: ['folio', '11r', 7], text: 'Betaelt aen meester Joost de fluytmaecker voor een stel fluyten, vier stucx, 18 gulden.', translation: 'Paid to master Joost the flute maker for a set of recorders, four pieces, 18 guilders.', mentions: [['fluyten', 'nl', 'alto', 'probable']], date: '1657' },
      { at: ['folio', '14v', 10], text: 'Noch voor een groote bas fluyt met sijn tas, 9 gulden.', translation: 'Also for a large bass recorder with its bag, 9 guilders.', mentions: [['groote bas fluyt', 'nl', 'bass', 'probable']], date: '1659' },
      { at: ['folio', '20r', 16], text: 'Aen den speelman Arent voor het stellen der fluyten op den toon van het orgel.', translation: 'To the musician Arent for setting the recorders to the pitch of the organ.', mentions: [['fluyten', 'nl', 'tenor', 'conjectural']], pitch: [['op den toon van het orgel', 466, 'inferred']], date: '1662' },
      { at: ['folio', '22v', 19], text: 'Een kleyn fluytgen voor den jongen heer, 2 gulden 10 stuyvers.', translation: 'A little recorder for the young master, 2 guilders 10 stuivers.', mentions: [['kleyn fluytgen', 'nl', 'soprano', 'probable']], date: '1664' },
      { at: ['folio', '25r', 24], text: 'Voor het repareren van de tenor fluyt die gebarsten was.', translation: 'For repairing the tenor recorder that was cracked.', mentions: [['tenor fluyt', 'nl', 'tenor', 'certain']], date: '166X' },
    ],
  },
  {
    state: 'approved', pages: 12,
    source: { ...base, title: 'Lettere di Ottavio Brunacci al maestro di cappella di Castelmirando', sourceType: 'letter', dateEdtf: '1688~', languages: ['it'], place: 'Castelmirando', creators: [{ name: 'Ottavio Brunacci', role: 'author' }], holdingInstitution: 'Biblioteca Civica di Montefosco (fictional)', shelfmark: 'Ms. Brun. 7' },
    excerpts: [
      { at: ['folio', '1r', 1], text: 'Le mando due flauti di voce, fatti dal Sig. Zanardi, che suonano al tuono del nostro organo.', translation: 'I send you two voice flutes made by Signor Zanardi, which play at the pitch of our organ.', mentions: [['flauti di voce', 'it', 'voice-flute', 'probable']], pitch: [['al tuono del nostro organo', 440, 'inferred']] },
      { at: ['folio', '2v', 4], text: 'Il flauto basso non risponde nelle note gravi, e bisogna rimandarlo.', translation: 'The bass recorder does not speak in the low notes and must be sent back.', mentions: [['flauto basso', 'it', 'bass', 'certain']] },
      { at: ['folio', '4r', 7], text: 'Desidero un flautino per le sinfonie pastorali di Natale.', translation: 'I would like a little flute for the Christmas pastoral symphonies.', mentions: [['flautino', 'it', 'sopranino', 'probable']], date: '1688-11' },
      { at: ['folio', '5r', 9], text: 'Il flauto comune sta una quinta sotto il flautino, come sa Vostra Signoria.', translation: 'The common recorder lies a fifth below the little flute, as Your Lordship knows.', mentions: [['flauto comune', 'it', 'alto', 'certain'], ['flautino', 'it', 'soprano', 'conjectural']] },
      { at: ['folio', '6v', 12], text: 'Quanto al corista, il nostro e alquanto piu basso di quello di Venezia.', translation: 'As for the pitch, ours is somewhat lower than that of Venice.', mentions: [['flauti', 'it', 'alto', 'conjectural']], pitch: [['alquanto piu basso', 430, 'inferred']] },
    ],
  },
  {
    state: 'approved', pages: 20,
    source: { ...base, title: 'Diary of Thomasina Hallowmere of Fenwick Parva', sourceType: 'diary', dateEdtf: '169X', languages: ['en'], place: 'Fenwick Parva', creators: [{ name: 'Thomasina Hallowmere', role: 'author' }], holdingInstitution: 'Fenwick Parva Parish Chest (fictional)', shelfmark: 'FP/D/3' },
    excerpts: [
      { at: ['page', '14', 4], text: 'This evening my brother played upon his new recorder, a consort of four being sent from London in a leathern case.', mentions: [['recorder', 'en', 'alto', 'probable']], date: '1693-04' },
      { at: ['page', '22', 6], text: 'Mr Pellow brought his voice flute, which is a third under the common flute and goeth sweetly with the viol.', mentions: [['voice flute', 'en', 'voice-flute', 'certain'], ['common flute', 'en', 'alto', 'certain']] },
      { at: ['page', '37', 10], text: 'We tuned to the harpsichord, which stands a half note under the organ at church.', mentions: [['flutes', 'en', 'alto', 'conjectural']], pitch: [['a half note under the organ', 415, 'inferred']], date: '1695' },
      { at: ['page', '51', 14], text: 'The little fifth flute squeaks most dreadfully and the children will not leave it be.', mentions: [['fifth flute', 'en', 'soprano', 'probable']] },
      { at: ['page', '66', 18], text: 'My cousin has a German flute of ebony with one key, which he holds sideways like a fife.', mentions: [['German flute', 'en', 'flute-one-keyed', 'certain']], date: '1698?' },
    ],
  },
  {
    state: 'approved', pages: 10,
    source: { ...base, title: 'Acta capellae collegiatae Sancti Udalrici in Oderstadt', sourceType: 'court-record', dateEdtf: '1580/1590', languages: ['la'], place: 'Oderstadt', creators: [], holdingInstitution: 'Chapter Archive of St Udalric, Oderstadt (fictional)', shelfmark: 'Acta 4' },
    excerpts: [
      { at: ['folio', '3r', 2], text: 'Emptae sunt fistulae quinque, quas vulgo Blockpfeiffen vocant, pro musica capellae.', translation: 'Five pipes, commonly called recorders, were bought for the music of the chapel.', mentions: [['fistulae', 'la', 'tenor', 'conjectural'], ['Blockpfeiffen', 'de', 'tenor', 'probable']], date: '1582' },
      { at: ['folio', '4v', 4], text: 'Fistula maior, quae bassum canit, reparata est a tornatore.', translation: 'The larger pipe, which sings the bass, was repaired by the turner.', mentions: [['Fistula maior', 'la', 'bass', 'probable']], date: '1584' },
      { at: ['folio', '6r', 6], text: 'Fistula maxima, ad modum contrabassi, a magistro Eibenholt empta.', translation: 'A very large pipe, in the manner of a contrabass, bought from master Eibenholt.', mentions: [['Fistula maxima', 'la', 'contrabass', 'conjectural']], date: '1586' },
      { at: ['folio', '7v', 8], text: 'Cantores cum fistulis in tono chori concinere iubentur.', translation: 'The singers are ordered to sing together with the pipes at choir pitch.', mentions: [['fistulis', 'la', 'tenor', 'conjectural']], pitch: [['in tono chori', 466, 'inferred']], date: '1588' },
      { at: ['folio', '9r', 10], text: 'Fistula parva discantus pro pueris chori.', translation: 'A small treble pipe for the choirboys.', mentions: [['Fistula parva discantus', 'la', 'soprano', 'probable']], date: '1590' },
    ],
  },
  {
    state: 'approved', pages: 8,
    source: { ...base, title: 'Preis-Verzeichnis der Holzblasinstrumente des Drechslers Caspar Ambrosius Eibenholt', sourceType: 'makers-list', dateEdtf: '1732', languages: ['de'], place: 'Oderstadt', creators: [{ name: 'Caspar Ambrosius Eibenholt', role: 'maker' }], holdingInstitution: 'Velmark Guild Archive (fictional)', shelfmark: 'Zunft B 19' },
    excerpts: [
      { at: ['page', '1', 1], text: 'Eine Alt Flute douce von Buxbaum, im Cammer-Ton, 2 Thaler.', translation: 'An alto recorder of boxwood, at chamber pitch, 2 thalers.', mentions: [['Alt Flute douce', 'de', 'alto', 'certain']], pitch: [['im Cammer-Ton', 410, 'stated']] },
      { at: ['page', '2', 2], text: 'Eine Tenor Flute douce mit Klappe, 3 Thaler 12 Groschen.', translation: 'A tenor recorder with a key, 3 thalers 12 groschen.', mentions: [['Tenor Flute douce', 'de', 'tenor', 'certain']] },
      { at: ['page', '3', 3], text: 'Eine Bass Flute douce mit messingenem S-Bogen, 6 Thaler.', translation: 'A bass recorder with brass crook, 6 thalers.', mentions: [['Bass Flute douce', 'de', 'bass', 'certain']] },
      { at: ['page', '5', 5], text: 'Ein Flute traversiere mit einer Klappe, von Ebenholz, gestimmt wie in Frankreich.', translation: 'A transverse flute with one key, of ebony, tuned as in France.', mentions: [['Flute traversiere', 'de', 'flute-one-keyed', 'certain']], pitch: [['gestimmt wie in Frankreich', 392, 'inferred']] },
      { at: ['page', '6', 6], text: 'Ein Discant Flötgen fur Kinder, 16 Groschen.', translation: 'A little descant recorder for children, 16 groschen.', mentions: [['Discant Flötgen', 'de', 'soprano', 'certain']] },
    ],
  },
  {
    state: 'approved', pages: 6,
    source: { ...base, title: 'The Compleat Consort for Flutes: a Preface to the Lovers of Musick', sourceType: 'music-preface', dateEdtf: '1701/1703', languages: ['en'], place: 'Harrowgate Lacy', creators: [{ name: 'Jeremiah Thistlewood', role: 'author' }], holdingInstitution: 'Harrowgate Lacy Subscription Library (fictional)', shelfmark: 'Music Case 2' },
    excerpts: [
      { at: ['signature', 'A2', 2], text: 'These Aires are set for a Consort of Flutes, viz. a Treble, a Tenor and a Bass, such as are now commonly sold.', mentions: [['Treble', 'en', 'alto', 'certain'], ['Tenor', 'en', 'tenor', 'certain'], ['Bass', 'en', 'bass', 'certain']] },
      { at: ['signature', 'A2v', 3], text: 'The Fifth Flute may play the Treble part an Octave higher, if the Company desire it.', mentions: [['Fifth Flute', 'en', 'soprano', 'certain']] },
      { at: ['signature', 'A3', 4], text: 'He that hath a Voice Flute may play the Tunes in the third Part as they stand, it being a Third lower than the Common Flute.', mentions: [['Voice Flute', 'en', 'voice-flute', 'certain'], ['Common Flute', 'en', 'alto', 'certain']] },
      { at: ['signature', 'A3v', 5], text: 'All the Flutes must be tuned to the Harpsichord, which ought to stand at Consort pitch and not at Church pitch.', mentions: [['Flutes', 'en', 'alto', 'probable']], pitch: [['Consort pitch and not at Church pitch', 415, 'inferred']] },
      { at: ['signature', 'A4', 6], text: 'Some have a great Bass Flute of eight foot, but it is seldom heard and costly.', mentions: [['great Bass Flute', 'en', 'great-bass', 'probable']] },
    ],
  },
  {
    state: 'approved', pages: 4,
    source: { ...base, title: 'Letter from Nathaniel Ashcombe to the Steward of Harrowgate Lacy, dated 10 February 1700/01', sourceType: 'letter', dateEdtf: '1701-02-21', calendarNote: 'old-style', languages: ['en'], place: 'Harrowgate Lacy', creators: [{ name: 'Nathaniel Ashcombe', role: 'author' }], holdingInstitution: 'Harrowgate Lacy Estate Office (fictional)', shelfmark: 'Corr. 1701/4' },
    excerpts: [
      { at: ['page', '1', 1], text: 'I have this day sent by the carrier two Flutes in a box, the one a Treble, the other a Flute du quatre, as my Lord desired.', mentions: [['Treble', 'en', 'alto', 'certain'], ['Flute du quatre', 'en', 'soprano', 'probable']], commentary: 'Dated *10 February 1700/01* (Old Style, year from 25 March): 21 February 1701 in the Gregorian calendar.' },
      { at: ['page', '2', 2], text: 'The maker sayeth they are pitched to the new harpsichord and will not agree with the old organ, which is near a whole tone sharper.', mentions: [['Flutes', 'en', 'alto', 'probable']], pitch: [['to the new harpsichord', 404, 'inferred'], ['near a whole tone sharper', 453, 'inferred']] },
      { at: ['page', '3', 3], text: 'If my Lord will have a Bass to them I can procure one for forty shillings.', mentions: [['Bass', 'en', 'bass', 'probable']] },
      { at: ['page', '3', 3], text: 'Pray tell Mr Pellow his Voice Flute is mended and the crack bound with silver.', mentions: [['Voice Flute', 'en', 'voice-flute', 'certain']] },
      { at: ['page', '4', 4], text: 'Your most humble servant, N. Ashcombe. London the 10th of February 1700/01.', mentions: [['Flutes', 'en', 'alto', 'conjectural']] },
    ],
  },
  {
    state: 'approved', pages: 4,
    source: { ...base, title: "Gazette d'Oderstadt: annonce du facteur Lambert Poirevert", sourceType: 'newspaper', dateEdtf: '1764-05-12', languages: ['fr'], place: 'Oderstadt', creators: [], holdingInstitution: 'Library of the Velmark Music Society (fictional)', shelfmark: 'Per. 12/1764', publication: { publisher: 'Imprimerie du Pont-Neuf (fictional)', place: 'Oderstadt', edition: null } },
    excerpts: [
      { at: ['column', '145', 1], text: "Le Sieur Poirevert, facteur d'instrumens, vend des Flutes traversieres a une clef, au ton de l'Opera.", translation: 'Mr Poirevert, instrument maker, sells transverse flutes with one key, at opera pitch.', mentions: [['Flutes traversieres', 'fr', 'flute-one-keyed', 'certain']], pitch: [["au ton de l'Opera", 392, 'stated']] },
      { at: ['column', '145b', 1], text: 'Il a aussi des Flutes a bec de toutes grandeurs, depuis le petit Flageolet jusqu a la grande Basse.', translation: 'He also has recorders of all sizes, from the little flageolet to the great bass.', mentions: [['Flutes a bec', 'fr', 'alto', 'probable'], ['grande Basse', 'fr', 'great-bass', 'conjectural']] },
      { at: ['column', '146', 2], text: 'Les Flutes a bec au ton de Chapelle se vendent moins cher.', translation: 'Recorders at chapel pitch sell for less.', mentions: [['Flutes a bec', 'fr', 'alto', 'probable']], pitch: [['au ton de Chapelle', 425, 'inferred']] },
      { at: ['column', '146a', 2], text: 'Une Flute de voix en ivoire, de rencontre, a vendre.', translation: 'A second-hand ivory voice flute for sale.', mentions: [['Flute de voix', 'fr', 'voice-flute', 'certain']] },
      { at: ['column', '147', 3], text: 'Il raccommode les Flutes et autres instrumens a vent.', translation: 'He repairs flutes and other wind instruments.', mentions: [['Flutes', 'fr', 'flute-one-keyed', 'conjectural']] },
    ],
  },
  {
    state: 'draft', pages: 14,
    source: { ...base, title: 'Inventario della guardaroba del Palazzo Serravalle di Montefosco', sourceType: 'inventory', dateEdtf: '1550~', languages: ['it'], place: 'Montefosco', creators: [], holdingInstitution: 'Archivio Serravalle (fictional)', shelfmark: 'Guard. 1' },
    excerpts: [
      { at: ['folio', '8r', 5], text: 'Una cassa di flauti sei, cioe due soprani, due tenori e due bassi.', translation: 'A case of six recorders, namely two sopranos, two tenors and two basses.', mentions: [['soprani', 'it', 'soprano', 'probable'], ['tenori', 'it', 'tenor', 'probable'], ['bassi', 'it', 'bass', 'probable']] },
      { at: ['folio', '9v', 8], text: 'Un flauto grande da contrabasso, senza cassa.', translation: 'A large contrabass recorder, without a case.', mentions: [['flauto grande da contrabasso', 'it', 'contrabass', 'conjectural']] },
      { at: ['folio', '12r', 13], text: 'Flauti due piccoli, guasti.', translation: 'Two small recorders, damaged.', mentions: [['Flauti piccoli', 'it', 'sopranino', 'conjectural']], pitch: [['(no pitch stated; corista of the palace organ)', 460, 'inferred']] },
    ],
  },
  {
    state: 'submitted', pages: 40,
    source: { ...base, title: 'Kurtze Anweisung zur Handflöte und Querflöte, für Liebhaber in Velmark', sourceType: 'tutor', dateEdtf: '1789', languages: ['de'], place: 'Velmark', creators: [{ name: 'Friederike Amalie Sternhauer', role: 'author' }], holdingInstitution: 'Library of the Velmark Music Society (fictional)', shelfmark: 'Mus. Th. 212', publication: { publisher: 'Gebrüder Kranichfeld (fictional)', place: 'Velmark', edition: null } },
    excerpts: [
      { at: ['page', '4', 4], text: 'Die Handflöte, oder Flute douce, ist heut zu Tage fast ausser Gebrauch gekommen.', translation: 'The recorder, or flute douce, has nowadays almost gone out of use.', mentions: [['Handflöte', 'de', 'alto', 'probable'], ['Flute douce', 'de', 'alto', 'probable']] },
      { at: ['page', '9', 9], text: 'Die Querflöte mit einer Klappe stehet im Kammerton, welcher hier etwas höher als in Paris ist.', translation: 'The one-keyed transverse flute stands at chamber pitch, which here is somewhat higher than in Paris.', mentions: [['Querflöte', 'de', 'flute-one-keyed', 'certain']], pitch: [['Kammerton, etwas höher als in Paris', 422, 'inferred']] },
      { at: ['page', '17', 17], text: 'Auf der Alt-Handflöte greift man das tiefe F mit allen Löchern zu.', translation: 'On the alto recorder the low F is fingered with all holes closed.', mentions: [['Alt-Handflöte', 'de', 'alto', 'certain']] },
      { at: ['page', '26', 26], text: 'Die Tenor-Handflöte stehet eine Quinte tiefer als die Alt-Handflöte.', translation: 'The tenor recorder stands a fifth lower than the alto recorder.', mentions: [['Tenor-Handflöte', 'de', 'tenor', 'certain']] },
      { at: ['page', '38', 38], text: 'Manche Liebhaber stimmen ihre Flöten nach einer Stimmgabel von Messing, die der hiesige Orgelmacher verkaufet.', translation: 'Some amateurs tune their flutes to a brass tuning fork sold by the local organ builder.', mentions: [['Flöten', 'de', 'flute-one-keyed', 'probable']], pitch: [['nach einer Stimmgabel von Messing', 423, 'measured']] },
    ],
  },
];
