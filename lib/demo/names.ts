// Name pools for the invented demo literature. Every surname below is used only to build invented
// authors with random initials; well-known methodologists' and textbook authors' surnames were
// deliberately left out so that no demo citation reads like a citation of a real work.
// Venue, book and publisher names are invented place names joined to generic subject words.

export const SURNAMES: readonly string[] = [
  "Abara", "Aguda", "Agbaje", "Ahlgren", "Akintola", "Alvarado", "Amsel", "Andrade", "Arslan", "Asante",
  "Bakshi", "Balogun", "Barros", "Bechtel", "Bekele", "Bianchi", "Björklund", "Boateng", "Bondarenko", "Brandt",
  "Chaudhry", "Çelik", "Dahl", "Dasgupta", "Delacroix", "Dimitrova", "Ebrahimi", "Eklund", "Escobar", "Fagerlund",
  "Farouk", "Ferreira", "Fonseca", "Gallardo", "Garnier", "Ghosh", "Gunawardena", "Haddad", "Hakimi", "Halvorsen",
  "Hartmann", "Heikkinen", "Hosseini", "Ibekwe", "Iwasaki", "Jankowski", "Jovanović", "Kamau", "Karlsson", "Kaur",
  "Keskin", "Khumalo", "Kiplagat", "Kowalczyk", "Kumari", "Lachance", "Lopes", "Madsen", "Mahlangu", "Marchetti",
  "Matsuda", "Mbatha", "Mendes", "Moreau", "Mukherjee", "Navarro", "Ndlovu", "Nieminen", "Obi", "Odhiambo",
  "Okonkwo", "Olabode", "Ortega", "Oyelaran", "Özdemir", "Pacheco", "Palmqvist", "Papadakis", "Pereira", "Rahimi",
  "Reyes", "Rinaldi", "Sabry", "Sandoval", "Sato", "Schreiber", "Sepúlveda", "Shrestha", "Sørensen", "Suleiman",
  "Takeda", "Tamang", "Teixeira", "Toivonen", "Tshabalala", "Uchenna", "Valdivia", "Veit", "Virtanen", "Wachira",
  "Wekesa", "Wójcik", "Yamada", "Yilmaz", "Zapata", "Zeller", "Aalto", "Bazarov", "Cisse", "Duarte", "Egwu",
  "Fiala", "Grønli", "Hamidou", "Ishikawa", "Jaramillo", "Kovacs", "Lemaire", "Mutua", "Nakagawa", "Oosterhuis",
  "Pillai", "Quaye", "Ranta", "Sahin", "Tembo", "Ulloa", "Vasquez-Hale", "Wiśniewska", "Xiong-Berg", "Yusuf",
];

export const INITIALS = "ABCDEFGHIJKLMNOPRSTVWY";

/** Outside (non-corpus) invented journals that only appear in reference lists. */
export const OUTSIDE_JOURNALS: readonly string[] = [
  "Bellhaven Annals of Organisational Life",
  "Marrowby Letters in Consumer Psychology",
  "Stonebridge Studies in Schooling",
  "Glenrock Papers in Health and Behaviour",
  "Farrowdale Computing and Society",
  "Wrenfield Bulletin of Social Inquiry",
];

export const PUBLISHERS: readonly string[] = ["Kestrel House", "Harlow Bridge Press", "Lowfield Academic", "Greyfriars Lane Press", "Fenwick & Rowe"];
