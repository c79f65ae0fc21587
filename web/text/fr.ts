import type { TextKey } from './en.ts';

/**
 * The French bundle, partial on purpose: the frame of every page, the caution, numbers,
 * directions, bands and the safety advice are translated; the rest falls back to English
 * (web/text/translator.ts), which shows how a partly translated language behaves.
 */
export const FR: Readonly<Partial<Record<TextKey, string>>> = {
  'site.tagline': 'Dépistage des secousses sismiques pour les petites communautés',
  'site.skip': 'Aller au contenu principal',
  'nav.main': 'Principal',
  'nav.studies': 'Études',
  'nav.limits': 'Limites d’un dépistage',
  'nav.study': 'Cette étude',
  'nav.overview': 'Vue d’ensemble',
  'nav.scenario': 'Scénario',
  'nav.catalog': 'Catalogue de séismes',
  'nav.edit': 'Modifier l’étude',
  'lang.label': 'Langue',
  'lang.change': 'Changer',
  'footer.version': 'Tremora {version}.',
  'footer.demo': 'Toutes les données de cette étude de démonstration sont inventées.',
  'numbers.small': 'zéro|un|deux|trois|quatre|cinq|six|sept|huit|neuf|dix',

  'caution.title': 'Un dépistage, pas une valeur de calcul',
  'caution.text':
    'Ces chiffres sont une estimation de dépistage, pas une valeur de calcul. Ne les utilisez pas pour concevoir, réparer, autoriser ou assurer un bâtiment. Les codes de construction et les ingénieurs agréés décident.',
  'caution.short':
    'Estimation de dépistage, pas une valeur de calcul. Les codes de construction et les ingénieurs agréés décident.',
  'caution.limitsLink': 'Lire les limites d’un dépistage',

  'chance.oneIn': 'environ 1 sur {n}',
  'chance.inTen': 'environ {k} sur 10',
  'chance.lessThan': 'moins de 1 sur {n}',
  'chance.moreThanNine': 'plus de 9 sur 10',
  'chance.percent': '{p} %',
  'chance.percentBelow': 'moins de {p} %',
  'chance.overYears': '{frequency} au cours des {years} prochaines années ({percent})',

  'place.here': 'sous cet endroit ou tout près',
  'place.away': 'à {km} km au {direction}',
  'compass.N': 'nord',
  'compass.NE': 'nord-est',
  'compass.E': 'est',
  'compass.SE': 'sud-est',
  'compass.S': 'sud',
  'compass.SW': 'sud-ouest',
  'compass.W': 'ouest',
  'compass.NW': 'nord-ouest',

  'band.label': 'Niveau de dépistage',
  'band.refer-first': 'À signaler d’abord',
  'band.refer-soon': 'À signaler bientôt',
  'band.prepare': 'Préparer et informer',
  'band.inform': 'Informer',

  'home.title': 'Études',
  'home.new': 'Commencer une nouvelle étude',
  'studyForm.name': 'Nom de l’étude',
  'studyForm.cancel': 'Retour à la liste des études',
  'newStudy.title': 'Commencer une nouvelle étude',
  'newStudy.intro':
    'Donnez un nom à l’étude et, si vous l’avez, le fichier qui liste les villages. Vous pouvez aussi ajouter les villages un par un. Les failles et autres sources s’ajoutent ensuite dans l’éditeur.',
  'newStudy.file': 'Fichier des villages (facultatif)',
  'newStudy.fileHelp':
    'CSV, XLSX, KML, KMZ, shapefile zippé ou points GeoJSON. Chaque village a besoin d’un nom, d’une position et d’un Vs30 ou d’une classe de site.',
  'newStudy.button': 'Créer l’étude',
  'renameStudy.title': 'Renommer {name}',
  'renameStudy.button': 'Enregistrer le nom',
  'duplicateStudy.title': 'Copier {name}',
  'duplicateStudy.intro':
    'La copie reçoit les communautés, les sources, les modèles de mouvement du sol et les réglages, mais pas les calculs, les cartes ni le catalogue de séismes.',
  'duplicateStudy.name': '{name} (copie)',
  'duplicateStudy.button': 'Faire la copie',
  'deleteStudy.title': 'Supprimer {name} ?',
  'deleteStudy.intro': 'C’est définitif. Ceci part avec l’étude :',
  'deleteStudy.document': 'ses communautés, sources, modèles de mouvement du sol et réglages',
  'deleteStudy.runs': 'calculs : {n}',
  'deleteStudy.maps': 'cartes d’aléa : {n}',
  'deleteStudy.catalogs': 'catalogues de séismes : {n}',
  'deleteStudy.unfinished': '{n} d’entre eux sont encore en cours ; ils seront arrêtés.',
  'deleteStudy.button': 'Supprimer l’étude',
  'deleteStudy.keep': 'La garder',
  'deleteStudy.done': 'L’étude a été supprimée.',
  'source.add': 'Ajouter une source',
  'source.edit': 'Modifier {name}',
  'source.remove': 'Retirer {name}',
  'source.save': 'Enregistrer la source',
  'source.field.coordinates': 'Coordonnées',
  'source.field.order': 'Ordre des nombres sur chaque ligne',
  'source.choice.auto': 'déduire des nombres',
  'source.choice.lon-lat': 'longitude latitude',
  'source.choice.lat-lon': 'latitude, longitude',
  'studyActions.rename': 'Renommer {name}',
  'studyActions.duplicate': 'Copier {name}',
  'studyActions.delete': 'Supprimer {name}',
  'draft.title': 'Cette étude n’est pas encore complète',
  'draft.text':
    'Elle ne peut pas être calculée tant qu’elle n’a pas au moins une communauté et une source. Il manque encore :',
  'draft.communities': 'des communautés (les villages)',
  'draft.sources': 'des sources (failles, zones ou points)',
  'draft.edit': 'Les ajouter dans l’éditeur',

  'safety.before.title': 'Avant les secousses',
  'safety.during.title': 'Pendant les secousses',
  'safety.during':
    'Mettez-vous à genoux. Protégez votre tête et votre nuque sous une table solide ou contre un mur intérieur. Tenez bon jusqu’à la fin des secousses.\nRestez où vous êtes. Ne sortez pas en courant pendant que le sol tremble.\nAu lit, restez-y et protégez votre tête avec un oreiller.\nDehors, éloignez-vous des bâtiments, des arbres, des lignes électriques et des pentes.\nEn voiture, arrêtez-vous dans un endroit dégagé et restez à l’intérieur.',
  'safety.after.title': 'Après les secousses',
  'tsunami.title': 'Sur la côte : montez sur les hauteurs',

  'limits.title': 'Les limites d’un dépistage',

  'error.notFound': 'Page introuvable',
  'error.home': 'Aller à la liste des études',
};
